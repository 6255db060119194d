import type { MappingDraft } from '@/lib/import/mapping-draft';
import type { GpsColumnMapping, StationColumnMapping } from '@/lib/survey/column-mapping';
import { ColumnSelect, UnitToggle } from './column-select';
import { HeightSourceSelect } from './height-source-select';

type Update = (change: (d: MappingDraft) => MappingDraft) => void;

const GPS_FIELDS: { key: keyof GpsColumnMapping; label: string; required?: boolean }[] = [
  { key: 'latitude', label: 'Latitude', required: true },
  { key: 'longitude', label: 'Longitude', required: true },
  { key: 'elevation', label: 'Elevation or altitude', required: true },
  { key: 'time', label: 'Time' },
  { key: 'name', label: 'Name or note' },
  { key: 'accuracy', label: 'Accuracy' },
];

const STATION_FIELDS: { key: keyof StationColumnMapping; label: string; required?: boolean }[] = [
  { key: 'chainage', label: 'Chainage (distance along)', required: true },
  { key: 'elevation', label: 'Elevation', required: true },
  { key: 'name', label: 'Name or note' },
];

/** Column mapping of a phone or handheld GPS CSV, with height units and source. */
export function GpsColumns({ draft, headers, update }: { draft: MappingDraft; headers: string[]; update: Update }) {
  const setColumn = (key: keyof GpsColumnMapping, value: number | null) =>
    update((d) => ({ ...d, gps: { ...d.gps, mapping: { ...d.gps.mapping, [key]: value } } }));
  return (
    <div className="space-y-3">
      <div className="grid gap-3 sm:grid-cols-3">
        {GPS_FIELDS.map((f) => (
          <ColumnSelect
            key={f.key}
            id={`col-${f.key}`}
            label={f.label}
            headers={headers}
            value={draft.gps.mapping[f.key]}
            required={f.required}
            onChange={(v) => setColumn(f.key, v)}
          />
        ))}
      </div>
      <div className="flex flex-wrap items-end gap-6">
        <UnitToggle
          name="gps-elevation-unit"
          legend="Elevation is in"
          value={draft.gps.elevationUnit}
          onChange={(u) => update((d) => ({ ...d, gps: { ...d.gps, elevationUnit: u } }))}
        />
        {draft.gps.mapping.accuracy !== null && (
          <label className="flex items-center gap-2 text-sm">
            <input
              type="checkbox"
              checked={draft.gps.accuracyIsVertical}
              onChange={(e) => update((d) => ({ ...d, gps: { ...d.gps, accuracyIsVertical: e.target.checked } }))}
            />
            Accuracy is vertical (otherwise horizontal, taken ×1.5 for height)
          </label>
        )}
        <div className="w-64">
          <HeightSourceSelect
            id="gps-height-source"
            value={draft.gps.heightSource}
            onChange={(v) => update((d) => ({ ...d, gps: { ...d.gps, heightSource: v } }))}
          />
        </div>
      </div>
    </div>
  );
}

/** Column mapping of a station/elevation table. */
export function StationColumns({ draft, headers, update }: { draft: MappingDraft; headers: string[]; update: Update }) {
  const setColumn = (key: keyof StationColumnMapping, value: number | null) =>
    update((d) => ({ ...d, station: { ...d.station, mapping: { ...d.station.mapping, [key]: value } } }));
  return (
    <div className="space-y-3">
      <div className="grid gap-3 sm:grid-cols-3">
        {STATION_FIELDS.map((f) => (
          <ColumnSelect
            key={f.key}
            id={`col-${f.key}`}
            label={f.label}
            headers={headers}
            value={draft.station.mapping[f.key]}
            required={f.required}
            onChange={(v) => setColumn(f.key, v)}
          />
        ))}
      </div>
      <div className="flex flex-wrap items-end gap-6">
        <UnitToggle
          name="station-chainage-unit"
          legend="Chainage is in"
          value={draft.station.chainageUnit}
          onChange={(u) => update((d) => ({ ...d, station: { ...d.station, chainageUnit: u } }))}
        />
        <UnitToggle
          name="station-elevation-unit"
          legend="Elevation is in"
          value={draft.station.elevationUnit}
          onChange={(u) => update((d) => ({ ...d, station: { ...d.station, elevationUnit: u } }))}
        />
        <div className="w-64">
          <HeightSourceSelect
            id="station-height-source"
            value={draft.station.heightSource}
            onChange={(v) => update((d) => ({ ...d, station: { ...d.station, heightSource: v } }))}
          />
        </div>
      </div>
    </div>
  );
}

/** The roles shown above the sample table's columns for the chosen format. */
export function columnRoles(draft: MappingDraft): Record<number, string> {
  const roles: Record<number, string> = {};
  const fields = draft.format === 'gps-csv' ? GPS_FIELDS : draft.format === 'station-csv' ? STATION_FIELDS : [];
  const mapping: Record<string, number | null> =
    draft.format === 'gps-csv' ? { ...draft.gps.mapping } : { ...draft.station.mapping };
  for (const f of fields) {
    const i = mapping[f.key];
    if (i !== null && i !== undefined) roles[i] = f.label.split(' ')[0].toLowerCase();
  }
  return roles;
}
