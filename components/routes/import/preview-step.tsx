import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { formatNumber, formatQuantity } from '@/lib/units';
import { IMPORT_SMOOTHING_WINDOW, type ImportPreview } from '@/lib/import/protocol';
import type { UnitSystem } from '@/lib/units';
import { FORMAT_LABELS } from '../format-labels';
import { GpsWarningBanner } from '../gps-warning-banner';
import { RouteProfile } from '../route-profile';

export interface PreviewStepProps {
  preview: ImportPreview;
  units: UnitSystem;
  saving: boolean;
  onBack: () => void;
  /** `smooth`: propose smoothing of the heights on the route page straight after saving. */
  onSave: (smooth: boolean) => void;
}

/** What will be saved: the numbers, the profile, every warning, before anything is stored. */
export function PreviewStep({ preview, units, saving, onBack, onSave }: PreviewStepProps) {
  // A consumer-GPS walk is offered smoothing (the user ticks it); a levelled route is not offered it.
  const [smooth, setSmooth] = useState(false);
  const s = preview.stats;
  const spikes = preview.proposals.length;
  // The consumer-GPS note is the banner above; the list holds the rest.
  const notes = preview.warnings.filter((w) => w.code !== 'consumer-gps-heights');
  const noteCount = preview.warningCount - (preview.warnings.length - notes.length);
  return (
    <div className="space-y-4">
      {preview.gpsWarning && <GpsWarningBanner units={units} warning={preview.gpsWarning} />}
      <dl className="grid gap-3 text-sm sm:grid-cols-4">
        <div>
          <dt className="text-creek-600">Read as</dt>
          <dd className="font-medium">{FORMAT_LABELS[s.format]}</dd>
        </div>
        <div>
          <dt className="text-creek-600">Points</dt>
          <dd className="tabular font-medium">{formatNumber(s.pointCount, 0)}</dd>
        </div>
        <div>
          <dt className="text-creek-600">Length (horizontal)</dt>
          <dd className="tabular font-medium">{formatQuantity('length', s.totalHorizontalLengthM, units)}</dd>
        </div>
        <div>
          <dt className="text-creek-600">Along the ground</dt>
          <dd className="tabular font-medium">{formatQuantity('length', s.totalSlopeLengthM, units)}</dd>
        </div>
        <div>
          <dt className="text-creek-600">Lowest</dt>
          <dd className="tabular font-medium">{formatQuantity('elevation', s.minElevationM, units)}</dd>
        </div>
        <div>
          <dt className="text-creek-600">Highest</dt>
          <dd className="tabular font-medium">{formatQuantity('elevation', s.maxElevationM, units)}</dd>
        </div>
        {s.closureErrorM !== undefined && (
          <div>
            <dt className="text-creek-600">Closure error</dt>
            <dd className="tabular font-medium">{formatNumber(s.closureErrorM * 1000, 0)} mm</dd>
          </div>
        )}
        <div>
          <dt className="text-creek-600">Exact duplicates</dt>
          <dd className="tabular font-medium">{s.duplicateCount}</dd>
        </div>
      </dl>
      <RouteProfile
        cleaned={preview.profile}
        units={units}
        title={`Ground profile of the file, ${s.pointCount} points`}
        markers={[]}
      />
      {spikes > 0 && (
        <p className="rounded-md border border-ochre-100 bg-ochre-50 px-3 py-2 text-sm text-ochre-700">
          The clean-up checks found {spikes} point{spikes === 1 ? '' : 's'} to look at (spikes, outliers, duplicates).
          Nothing is changed on import: the route page lists each one for you to accept or reject.
        </p>
      )}
      {notes.length > 0 && (
        <section aria-label="Import notes">
          <h3 className="text-sm font-medium text-creek-900">Notes on the file ({noteCount})</h3>
          <ul className="mt-1 max-h-48 list-disc space-y-0.5 overflow-y-auto pl-5 text-sm text-creek-800">
            {notes.map((w, i) => (
              <li key={i}>
                {w.line !== undefined ? `line ${w.line}: ` : ''}
                {w.message}
              </li>
            ))}
          </ul>
        </section>
      )}
      {preview.features.length > 0 && (
        <p className="text-sm text-creek-700">
          Waypoints placed along the route:{' '}
          {preview.features.map((f) => `${f.label} (${formatQuantity('length', f.chainageM, units, 0)})`).join(', ')}.
        </p>
      )}
      {preview.gpsWarning && (
        <label
          className="flex items-start gap-2 rounded-md border border-creek-100 bg-creek-50/60 px-3 py-2 text-sm text-creek-900"
          data-testid="offer-smoothing"
        >
          <input type="checkbox" checked={smooth} onChange={(e) => setSmooth(e.target.checked)} className="mt-1" />
          <span>
            Propose smoothing of the heights after saving (moving median of {IMPORT_SMOOTHING_WINDOW} points). The GPS
            heights scatter; summits and lows that stand out of that scatter keep their heights, and you accept or
            reject the changes on the route page. The surveyed heights are always kept.
          </span>
        </label>
      )}
      <div className="flex flex-wrap gap-3">
        <Button tone="quiet" onClick={onBack} disabled={saving}>
          Back to the mapping
        </Button>
        <Button onClick={() => onSave(smooth)} disabled={saving}>
          {saving ? 'Saving…' : 'Save route'}
        </Button>
      </div>
    </div>
  );
}
