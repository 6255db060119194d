'use client';

import { offLineWords, takenWords } from '@/lib/photos/words';
import { photoImageUrl, type NumberedPhoto } from '@/lib/queries/photos';
import { formatQuantity, type UnitSystem } from '@/lib/units';

/** The thumbnail of a marked photo with its chainage, time and distance off the line. */
export function PhotoCard({
  photo,
  units,
  onClose,
}: {
  photo: NumberedPhoto;
  units: UnitSystem;
  onClose?: () => void;
}) {
  const p = photo.source;
  return (
    <div
      role="dialog"
      aria-label={`Photo ${photo.number}`}
      data-testid="photo-card"
      className="w-56 rounded-md border border-creek-200 bg-white p-2 text-xs text-creek-800 shadow-lg"
    >
      <a href={photoImageUrl(p.id)} target="_blank" rel="noreferrer" title="Open the full-size photo">
        {/* eslint-disable-next-line @next/next/no-img-element -- a signed-in API image, not a static asset */}
        <img
          src={photoImageUrl(p.id, 'thumbnail')}
          alt={photo.label}
          className="mb-1.5 max-h-36 w-full rounded object-contain"
        />
      </a>
      <p className="font-semibold text-creek-900">
        Photo {photo.number} · {formatQuantity('chainage', photo.chainageM, units)}
      </p>
      {p.caption && <p>{p.caption}</p>}
      <p>Taken {takenWords(p.takenAt)}</p>
      <p>{offLineWords(p, units)}</p>
      <p className="truncate text-creek-600">{p.fileName}</p>
      {onClose && (
        <button type="button" className="mt-1 underline" onClick={onClose}>
          Close
        </button>
      )}
    </div>
  );
}
