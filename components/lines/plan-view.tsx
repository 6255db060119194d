'use client';

import { useMemo, useRef } from 'react';
import type { LineDevice, LineWarning } from '@/hydraulics/index';
import { planScene, type PlanStation } from '@/lib/chart/plan-scene';
import type { DisplayUnits } from '@/lib/units';
import type { NumberedPhoto } from '@/lib/queries/photos';
import { PhotoCardOverlay, PhotoTargets, usePhotoCard } from '@/components/photos/photo-targets';
import { SvgNodeView } from './svg-node-view';

const SIZE = { width: 320, height: 320 };
const NO_PHOTOS: readonly NumberedPhoto[] = [];

/** The route from above; hovering it moves the profile's readout, and the profile's hover shows here. */
export function PlanView({
  stations,
  warnings,
  devices,
  units,
  hoverM,
  onHover,
  photos = NO_PHOTOS,
}: {
  stations: readonly PlanStation[];
  warnings: readonly LineWarning[];
  devices: readonly LineDevice[];
  units: DisplayUnits;
  hoverM: number | null;
  onHover: (chainageM: number | null) => void;
  /** Site photos: drawn where they were taken, their card shown on hover or click. */
  photos?: readonly NumberedPhoto[];
}) {
  const scene = useMemo(
    () => planScene(stations, warnings, devices, SIZE, units, photos),
    [stations, warnings, devices, units, photos],
  );
  const captureRef = useRef<SVGRectElement>(null);
  const card = usePhotoCard();
  const photoPlaces = useMemo(() => {
    const byId = new Map(photos.map((p) => [p.id, p]));
    return (scene?.photos ?? []).flatMap((place) => {
      const photo = byId.get(place.photo.id);
      return photo ? [{ photo, x: place.x, y: place.y }] : [];
    });
  }, [scene, photos]);
  if (!scene) {
    return (
      <p className="rounded-md border border-dashed border-creek-200 p-4 text-sm text-creek-700">
        This route has no map positions, so there is no plan to draw. The profile and tables still work.
      </p>
    );
  }
  const marker =
    hoverM === null
      ? null
      : scene.positions.reduce(
          (best, p) =>
            Math.abs(stations[p.index].chainageM - hoverM) < Math.abs(stations[best.index].chainageM - hoverM)
              ? p
              : best,
          scene.positions[0],
        );

  function onMove(event: React.PointerEvent<SVGRectElement>) {
    const rect = captureRef.current?.ownerSVGElement?.getBoundingClientRect();
    if (!rect || !scene) return;
    const x = ((event.clientX - rect.left) / rect.width) * SIZE.width;
    const y = ((event.clientY - rect.top) / rect.height) * SIZE.height;
    let best = scene.positions[0];
    let bestD = Infinity;
    for (const p of scene.positions) {
      const d = (p.x - x) ** 2 + (p.y - y) ** 2;
      if (d < bestD) {
        bestD = d;
        best = p;
      }
    }
    onHover(bestD <= 30 * 30 ? stations[best.index].chainageM : null);
  }

  return (
    <div className="relative rounded-md border border-creek-100" data-testid="plan-view">
      <SvgNodeView node={scene.root}>
        {marker && (
          <circle
            cx={marker.x}
            cy={marker.y}
            r={6}
            fill="none"
            stroke="#122e3a"
            strokeWidth={2.5}
            pointerEvents="none"
            data-testid="plan-marker"
          />
        )}
        <rect
          ref={captureRef}
          x={0}
          y={0}
          width={SIZE.width}
          height={SIZE.height}
          fill="transparent"
          onPointerMove={onMove}
          onPointerLeave={() => onHover(null)}
        />
        <PhotoTargets places={photoPlaces} card={card} />
      </SvgNodeView>
      <PhotoCardOverlay places={photoPlaces} card={card} units={units.system} width={SIZE.width} height={SIZE.height} />
    </div>
  );
}
