'use client';

import { useState, type ReactNode } from 'react';
import type { UnitSystem } from '@/lib/units';
import type { NumberedPhoto } from '@/lib/queries/photos';
import { PhotoCard } from './photo-card';

interface Place {
  photo: NumberedPhoto;
  x: number;
  y: number;
}

/**
 * Which photo's card is open: hovering or focusing a mark shows it, clicking keeps it open until
 * closed (or another is clicked).
 */
export function usePhotoCard() {
  const [shown, setShown] = useState<{ id: string; kept: boolean } | null>(null);
  return {
    shownId: shown?.id ?? null,
    kept: shown?.kept ?? false,
    hover: (id: string) => setShown((s) => (s?.kept ? s : { id, kept: false })),
    leave: () => setShown((s) => (s?.kept ? s : null)),
    click: (id: string) => setShown((s) => (s?.kept && s.id === id ? null : { id, kept: true })),
    close: () => setShown(null),
  };
}

export type PhotoCardState = ReturnType<typeof usePhotoCard>;

/** Pointer and keyboard targets over the photo marks of a drawing (SVG, drawn above its other layers). */
export function PhotoTargets({ places, card }: { places: readonly Place[]; card: PhotoCardState }) {
  return (
    <g data-layer="photo-targets">
      {places.map(({ photo, x, y }) => (
        <rect
          key={photo.id}
          x={x - 11}
          y={y - 11}
          width={22}
          height={22}
          fill="transparent"
          tabIndex={0}
          role="button"
          aria-label={`Photo ${photo.number}: ${photo.label}`}
          data-testid="photo-mark"
          data-photo-id={photo.id}
          style={{ cursor: 'pointer' }}
          onPointerEnter={() => card.hover(photo.id)}
          onPointerLeave={card.leave}
          onFocus={() => card.hover(photo.id)}
          onBlur={card.leave}
          onPointerDown={(e) => e.stopPropagation()}
          onClick={() => card.click(photo.id)}
          onKeyDown={(e) => {
            if (e.key === 'Enter' || e.key === ' ') {
              e.preventDefault();
              card.click(photo.id);
            }
            if (e.key === 'Escape') card.close();
          }}
        />
      ))}
    </g>
  );
}

/**
 * The open card, laid over the drawing beside its mark. `width`/`height` are the drawing's own
 * units, so the card follows the mark however the drawing is scaled on screen.
 */
export function PhotoCardOverlay({
  places,
  card,
  units,
  width,
  height,
}: {
  places: readonly Place[];
  card: PhotoCardState;
  units: UnitSystem;
  width: number;
  height: number;
}): ReactNode {
  const place = places.find((p) => p.photo.id === card.shownId);
  if (!place) return null;
  const leftShare = place.x / width;
  const style = {
    top: `${(Math.min(place.y + 14, height * 0.55) / height) * 100}%`,
    ...(leftShare > 0.6 ? { right: `${(1 - leftShare) * 100}%` } : { left: `${leftShare * 100}%` }),
  };
  return (
    <div
      className="absolute z-10"
      style={style}
      onPointerEnter={() => card.hover(place.photo.id)}
      onPointerLeave={card.leave}
    >
      <PhotoCard photo={place.photo} units={units} onClose={card.kept ? card.close : undefined} />
    </div>
  );
}
