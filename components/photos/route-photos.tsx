'use client';

import { useQuery } from '@tanstack/react-query';
import { useState, type FormEvent } from 'react';
import { Button } from '@/components/ui/button';
import { FormMessage } from '@/components/ui/form-message';
import { Panel } from '@/components/ui/panel';
import { HeadCell, TableFrame } from '@/components/ui/table-frame';
import type { PhotoSummary } from '@/lib/data/photos';
import { ApiError } from '@/lib/queries/fetch-json';
import { photoImageUrl, projectPhotosQuery, useUpdatePhoto, useUploadPhoto } from '@/lib/queries/photos';
import { formatQuantity, fromDisplay, unitOf, type UnitSystem } from '@/lib/units';

interface Props { projectId: string; routeId: string; units: UnitSystem; editable: boolean }

const PLACEMENT: Record<PhotoSummary['placement'], string> = {
  position: 'from its position',
  picked: 'picked by hand',
  unplaced: 'not placed',
};

/** The photos of a walk along this route: upload several at once; each lands at its chainage. */
export function RoutePhotos({ projectId, routeId, units, editable }: Props) {
  const { data: all = [] } = useQuery(projectPhotosQuery(projectId));
  const photos = all.filter((p) => p.routeId === routeId).sort((a, b) => (a.chainageM ?? Infinity) - (b.chainageM ?? Infinity));
  const upload = useUploadPhoto(projectId);
  const update = useUpdatePhoto(projectId);
  const [problems, setProblems] = useState<string[]>([]);
  const [done, setDone] = useState<string | null>(null);

  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const formElement = event.currentTarget;
    const form = new FormData(formElement);
    const files = form.getAll('photos').filter((f): f is File => f instanceof File && f.size > 0);
    const picked = String(form.get('chainage') ?? '').trim();
    const chainageM = picked === '' ? undefined : fromDisplay('chainage', Number(picked), units);
    setProblems([]);
    setDone(null);
    if (files.length === 0) return setProblems(['Choose one or more photos first']);
    if (chainageM !== undefined && !Number.isFinite(chainageM)) return setProblems(['The chainage must be a number']);
    const failed: string[] = [];
    let placed = 0;
    // One at a time: a phone's walk can hold dozens of large photos.
    for (const file of files) {
      try {
        await upload.mutateAsync({ file, routeId, chainageM });
        placed += 1;
      } catch (error) {
        failed.push(`${file.name}: ${error instanceof ApiError ? error.message : 'not uploaded, try again'}`);
      }
    }
    setProblems(failed);
    if (placed > 0) setDone(`${placed} photo${placed === 1 ? '' : 's'} added.`);
    formElement.reset();
  }

  return (
    <Panel title="Site photos on this route">
      {editable && (
        <form onSubmit={onSubmit} className="mb-4 grid gap-3 sm:grid-cols-[2fr_1fr_auto] sm:items-end" noValidate>
          <div>
            <label htmlFor="photos" className="block text-sm font-medium text-creek-900">Photos (JPEG, PNG or HEIC)</label>
            <input id="photos" name="photos" type="file" multiple accept="image/jpeg,image/png,image/heic,image/heif,.jpg,.jpeg,.png,.heic,.heif" className="mt-1 block w-full text-sm" />
            <p className="mt-1 text-xs text-creek-600">Photos with a GPS position land at the nearest chainage; only position and time are kept from the file.</p>
          </div>
          <div>
            <label htmlFor="chainage" className="block text-sm font-medium text-creek-900">Chainage for photos without a position ({unitOf('chainage', units)})</label>
            <input id="chainage" name="chainage" inputMode="decimal" className="mt-1 block w-full rounded-md border border-creek-200 px-3 py-2 text-sm" />
          </div>
          <Button type="submit" disabled={upload.isPending}>{upload.isPending ? 'Uploading…' : 'Add photos'}</Button>
          <div className="space-y-1 sm:col-span-3">
            {problems.map((p) => <FormMessage key={p} message={p} />)}
            <FormMessage tone="ok" message={done} />
          </div>
        </form>
      )}
      {photos.length === 0 ? (
        <p className="text-sm text-creek-600">No photos on this route yet.</p>
      ) : (
        <TableFrame head={<><HeadCell><span className="sr-only">Photo</span></HeadCell><HeadCell>Chainage</HeadCell><HeadCell>Off the line</HeadCell><HeadCell>Taken</HeadCell><HeadCell>File</HeadCell><HeadCell>In the report</HeadCell></>}>
          {photos.map((p) => (
            <tr key={p.id} className="border-t border-creek-50 align-middle">
              <td className="px-4 py-2">
                <a href={photoImageUrl(p.id)} target="_blank" rel="noreferrer">
                  {/* eslint-disable-next-line @next/next/no-img-element -- a signed-in API image, not a static asset */}
                  <img src={photoImageUrl(p.id, 'thumbnail')} alt={p.caption || p.fileName} className="h-14 w-20 rounded object-cover" />
                </a>
              </td>
              <td className="px-4 py-2 font-medium text-creek-900">
                {p.chainageM === null ? '—' : formatQuantity('chainage', p.chainageM, units)}
                <span className="block text-xs font-normal text-creek-600">{PLACEMENT[p.placement]}</span>
              </td>
              <td className="px-4 py-2 text-creek-700">{p.offsetM === null ? '—' : formatQuantity('length', p.offsetM, units)}</td>
              <td className="px-4 py-2 text-creek-700">{p.takenAt ? p.takenAt.slice(0, 16).replace('T', ' ') : '—'}</td>
              <td className="px-4 py-2 text-creek-700">{p.fileName}</td>
              <td className="px-4 py-2">
                <input
                  type="checkbox"
                  aria-label={`Show ${p.fileName} in the report`}
                  checked={p.inReport}
                  disabled={!editable || update.isPending}
                  onChange={(e) => update.mutate({ photoId: p.id, inReport: e.target.checked })}
                />
              </td>
            </tr>
          ))}
        </TableFrame>
      )}
    </Panel>
  );
}
