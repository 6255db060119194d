'use client';

import type { LineDeviceKind } from '@/hydraulics/index';
import { DEVICE_STYLE } from '@/lib/chart/profile-palette';
import { DEVICE_KINDS } from '@/lib/validations/line-design';
import { Button } from '@/components/ui/button';

const EXAGGERATIONS = [1, 2, 5, 10, 20, 50];

/** Zoom, vertical exaggeration and placing devices on the profile. */
export function LineToolbar({
  onZoomIn,
  onZoomOut,
  onWhole,
  exaggeration,
  onExaggeration,
  canEdit,
  placing,
  onPlacing,
  placeKind,
  onPlaceKind,
}: {
  onZoomIn: () => void;
  onZoomOut: () => void;
  onWhole: () => void;
  exaggeration: number | 'auto';
  onExaggeration: (value: number | 'auto') => void;
  canEdit: boolean;
  placing: boolean;
  onPlacing: (on: boolean) => void;
  placeKind: LineDeviceKind;
  onPlaceKind: (kind: LineDeviceKind) => void;
}) {
  return (
    <div className="flex flex-wrap items-end gap-2 text-sm">
      <div className="flex gap-1" role="group" aria-label="Zoom on chainage">
        <Button tone="quiet" className="px-2 py-1 text-xs" onClick={onZoomIn}>
          Zoom in
        </Button>
        <Button tone="quiet" className="px-2 py-1 text-xs" onClick={onZoomOut}>
          Zoom out
        </Button>
        <Button tone="quiet" className="px-2 py-1 text-xs" onClick={onWhole}>
          Whole line
        </Button>
      </div>
      <label className="text-xs text-creek-900">
        <span className="block font-medium">Vertical exaggeration</span>
        <select
          value={String(exaggeration)}
          onChange={(e) => onExaggeration(e.target.value === 'auto' ? 'auto' : Number(e.target.value))}
          className="mt-0.5 rounded-md border border-creek-200 bg-white px-2 py-1 text-sm"
        >
          <option value="auto">Fit the lines</option>
          {EXAGGERATIONS.map((x) => (
            <option key={x} value={x}>
              ×{x}
            </option>
          ))}
        </select>
      </label>
      {canEdit && (
        <div className="flex items-end gap-1">
          <label className="text-xs text-creek-900">
            <span className="block font-medium">Place on the profile</span>
            <select
              value={placeKind}
              onChange={(e) => onPlaceKind(e.target.value as LineDeviceKind)}
              className="mt-0.5 rounded-md border border-creek-200 bg-white px-2 py-1 text-sm"
            >
              {DEVICE_KINDS.map((k) => (
                <option key={k} value={k}>
                  {DEVICE_STYLE[k].label}
                </option>
              ))}
            </select>
          </label>
          <Button
            tone={placing ? 'primary' : 'quiet'}
            className="px-2 py-1 text-xs"
            aria-pressed={placing}
            onClick={() => onPlacing(!placing)}
          >
            {placing ? 'Click the profile… (cancel)' : 'Place by clicking'}
          </Button>
        </div>
      )}
      <p className="ml-auto text-xs text-creek-600">Wheel to zoom, drag to pan, click a warning to find it.</p>
    </div>
  );
}
