'use client';

import { useQuery } from '@tanstack/react-query';
import { useState, type FormEvent } from 'react';
import { UnitNumberInput } from '@/components/lines/unit-number-input';
import { Button } from '@/components/ui/button';
import { useDecimalMark } from '@/components/ui/decimal-mark';
import { FormMessage } from '@/components/ui/form-message';
import { Panel } from '@/components/ui/panel';
import { HeadCell, TableFrame } from '@/components/ui/table-frame';
import { numberPhotos } from '@/lib/chart/photo-marks';
import type { PhotoSummary } from '@/lib/data/photos';
import { offLineWords, takenWords } from '@/lib/photos/words';
import { ApiError } from '@/lib/queries/fetch-json';
import {
  photoImageUrl,
  projectPhotosQuery,
  useDeletePhoto,
  useUpdatePhoto,
  useUploadPhoto,
} from '@/lib/queries/photos';
import { formatQuantity, fromDisplay, toDisplay, unitOf, type UnitSystem } from '@/lib/units';
import { parseTypedNumber } from '@/lib/units/typed-number';
import { ThumbnailsSkeleton } from '@/components/ui/widget-skeletons';

interface Props {
  projectId: string;
  routeId: string;
  units: UnitSystem;
  editable: boolean;
}

const PLACEMENT: Record<PhotoSummary['placement'], string> = {
  position: 'from its position',
  picked: 'picked by hand',
  unplaced: 'not placed',
};

/** The photos of a walk along this route: upload several at once; each lands at its chainage. */
export function RoutePhotos({ projectId, routeId, units, editable }: Props) {
  const { data, isPending } = useQuery(projectPhotosQuery(projectId));
  const all = data ?? [];
  const mark = useDecimalMark();
  const onRoute = all.filter((p) => p.routeId === routeId);
  const numbers = new Map(numberPhotos(onRoute).map((p) => [p.id, p.number]));
  const photos = [...onRoute].sort((a, b) => (a.chainageM ?? Infinity) - (b.chainageM ?? Infinity));
  const upload = useUploadPhoto(projectId);
  const update = useUpdatePhoto(projectId);
  const remove = useDeletePhoto(projectId);
  const [problems, setProblems] = useState<string[]>([]);
  const [done, setDone] = useState<string | null>(null);
  const [rowProblem, setRowProblem] = useState<string | null>(null);
  const chainageUnit = unitOf('chainage', units);

  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const formElement = event.currentTarget;
    const form = new FormData(formElement);
    const files = form.getAll('photos').filter((f): f is File => f instanceof File && f.size > 0);
    const picked = parseTypedNumber(String(form.get('chainage') ?? ''), mark);
    setProblems([]);
    setDone(null);
    if (files.length === 0) return setProblems(['Choose one or more photos first']);
    if (!picked.ok) return setProblems([`Chainage: ${picked.error} in ${chainageUnit}`]);
    const chainageM = picked.value === null ? undefined : fromDisplay('chainage', picked.value, units);
    const failed: string[] = [];
    let placed = 0;
    // One at a time: a phone's walk can hold dozens of large photos.
    for (const file of files) {
      try {
        await upload.mutateAsync({ file, routeId, chainageM });
        placed += 1;
      } catch (error) {
        const why = error instanceof ApiError ? error.message : 'not uploaded, try again';
        failed.push(why.includes(file.name) ? why : `${file.name}: ${why}`);
      }
    }
    setProblems(failed);
    if (placed > 0) setDone(`${placed} photo${placed === 1 ? '' : 's'} added.`);
    formElement.reset();
  }

  function place(photo: PhotoSummary, value: number | undefined): string | null {
    if (value === undefined) return 'Type the chainage where the photo was taken';
    setRowProblem(null);
    update.mutate(
      { photoId: photo.id, routeId, chainageM: fromDisplay('chainage', value, units) },
      { onError: (e) => setRowProblem(`${photo.fileName}: ${e.message}`) },
    );
    return null;
  }

  if (isPending) return <RoutePhotosSkeleton />;
  return (
    <Panel title="Site photos on this route">
      {editable && (
        <form onSubmit={onSubmit} className="mb-4 grid gap-3 sm:grid-cols-[2fr_1fr_auto] sm:items-start" noValidate>
          <div>
            <label htmlFor="photos" className="block text-sm font-medium text-creek-900">
              Photos (JPEG, PNG or HEIC)
            </label>
            <input
              id="photos"
              name="photos"
              type="file"
              multiple
              accept="image/jpeg,image/png,image/heic,image/heif,.jpg,.jpeg,.png,.heic,.heif"
              aria-invalid={problems.length > 0 ? true : undefined}
              aria-describedby={problems.length > 0 ? 'photos-problems' : 'photos-hint'}
              className="mt-1 block w-full text-sm"
            />
            <p id="photos-hint" className="mt-1 text-xs text-creek-600">
              Photos with a GPS position land at the nearest chainage; only position and time are kept from the file.
            </p>
            {problems.length > 0 && (
              <ul id="photos-problems" className="mt-1 space-y-1" data-testid="photo-upload-problems">
                {problems.map((p) => (
                  <li key={p}>
                    <FormMessage message={p} />
                  </li>
                ))}
              </ul>
            )}
          </div>
          <div>
            <label htmlFor="chainage" className="block text-sm font-medium text-creek-900">
              Chainage for photos without a position ({chainageUnit})
            </label>
            <input
              id="chainage"
              name="chainage"
              inputMode="decimal"
              className="mt-1 block w-full rounded-md border border-creek-200 px-3 py-2 text-sm"
            />
          </div>
          <Button type="submit" className="sm:mt-6" disabled={upload.isPending}>
            {upload.isPending ? 'Uploading…' : 'Add photos'}
          </Button>
          <div className="sm:col-span-3">
            <FormMessage tone="ok" message={done} />
          </div>
        </form>
      )}
      <FormMessage message={rowProblem} />
      {photos.length === 0 ? (
        <p className="text-sm text-creek-600">No photos on this route yet.</p>
      ) : (
        <TableFrame
          head={
            <>
              <HeadCell>No.</HeadCell>
              <HeadCell>
                <span className="sr-only">Photo</span>
              </HeadCell>
              <HeadCell>Chainage</HeadCell>
              <HeadCell>Off the line</HeadCell>
              <HeadCell>Taken</HeadCell>
              <HeadCell>Caption and file</HeadCell>
              <HeadCell>In the report</HeadCell>
              {editable && (
                <HeadCell>
                  <span className="sr-only">Remove</span>
                </HeadCell>
              )}
            </>
          }
        >
          {photos.map((p) => (
            <tr
              key={p.id}
              className="border-t border-creek-50 align-middle"
              data-testid="photo-row"
              data-photo-id={p.id}
            >
              <td className="px-4 py-2 font-semibold text-creek-900">{numbers.get(p.id) ?? '—'}</td>
              <td className="px-4 py-2">
                <a href={photoImageUrl(p.id)} target="_blank" rel="noreferrer">
                  {/* eslint-disable-next-line @next/next/no-img-element -- a signed-in API image, not static */}
                  <img
                    src={photoImageUrl(p.id, 'thumbnail')}
                    alt={p.caption || p.fileName}
                    className="h-14 w-20 rounded object-cover"
                  />
                </a>
              </td>
              <td className="px-4 py-2 font-medium text-creek-900">
                {editable && p.placement !== 'position' ? (
                  <UnitNumberInput
                    id={`photo-chainage-${p.id}`}
                    label={`Chainage of ${p.fileName}`}
                    value={p.chainageM === null ? undefined : toDisplay('chainage', p.chainageM, units)}
                    unit={chainageUnit}
                    digits={1}
                    compact
                    onCommit={(v) => place(p, v)}
                  />
                ) : p.chainageM === null ? (
                  '—'
                ) : (
                  formatQuantity('chainage', p.chainageM, units)
                )}
                <span className="block text-xs font-normal text-creek-600">{PLACEMENT[p.placement]}</span>
              </td>
              <td className="px-4 py-2 text-creek-700">
                {p.offsetM === null ? '—' : formatQuantity('length', p.offsetM, units)}
                <span className="sr-only"> ({offLineWords(p, units)})</span>
              </td>
              <td className="px-4 py-2 text-creek-700">{p.takenAt ? takenWords(p.takenAt) : '—'}</td>
              <td className="px-4 py-2 text-creek-700">
                {editable ? (
                  <input
                    aria-label={`Caption of ${p.fileName}`}
                    defaultValue={p.caption}
                    maxLength={500}
                    placeholder="What it shows"
                    className="block w-full min-w-40 rounded-md border border-creek-200 px-2 py-1 text-sm"
                    onBlur={(e) => {
                      const caption = e.currentTarget.value.trim();
                      if (caption !== p.caption)
                        update.mutate(
                          { photoId: p.id, caption },
                          { onError: (err) => setRowProblem(`${p.fileName}: ${err.message}`) },
                        );
                    }}
                    onKeyDown={(e) => {
                      if (e.key === 'Enter') e.currentTarget.blur();
                    }}
                  />
                ) : (
                  p.caption && <span className="block text-creek-900">{p.caption}</span>
                )}
                <span className="block text-xs">{p.fileName}</span>
              </td>
              <td className="px-4 py-2">
                <input
                  type="checkbox"
                  aria-label={`Show ${p.fileName} in the report`}
                  checked={p.inReport}
                  disabled={!editable || update.isPending || p.chainageM === null}
                  onChange={(e) => update.mutate({ photoId: p.id, inReport: e.target.checked })}
                />
              </td>
              {editable && (
                <td className="px-4 py-2">
                  <button
                    type="button"
                    className="text-xs text-clay-700 underline"
                    disabled={remove.isPending}
                    onClick={() => remove.mutate(p.id)}
                  >
                    Remove
                  </button>
                </td>
              )}
            </tr>
          ))}
        </TableFrame>
      )}
    </Panel>
  );
}

export function RoutePhotosSkeleton() {
  return (
    <Panel title="Site photos on this route">
      <ThumbnailsSkeleton label="Loading the route's photos" />
    </Panel>
  );
}
