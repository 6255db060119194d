import type { FormEvent } from 'react';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import type { FieldErrors } from '@/lib/errors';
import { sampleDatesAmbiguous, type MappingDraft } from '@/lib/import/mapping-draft';
import type { CsvDelimiter, CsvDialect } from '@/lib/survey/csv-dialect';
import type { SurveyInspection } from '@/lib/survey/inspect';
import type { SurveyFormat } from '@/lib/survey/parsed-survey';
import type { UnitSystem } from '@/lib/units';
import { FORMAT_LABELS } from '../format-labels';
import { columnRoles, GpsColumns, StationColumns } from './csv-columns';
import { FieldBookFields } from './field-book-fields';
import { HeightSourceSelect } from './height-source-select';
import { SampleTable } from './sample-table';

const CSV_FORMATS: Exclude<SurveyFormat, 'gpx'>[] = ['gps-csv', 'station-csv', 'inclinometer-csv', 'level-book-csv'];
const DELIMITERS: { value: CsvDelimiter; label: string }[] = [
  { value: ',', label: 'Comma' },
  { value: ';', label: 'Semicolon' },
  { value: '\t', label: 'Tab' },
  { value: '|', label: 'Bar' },
];

export interface MappingStepProps {
  fileName: string;
  inspection: SurveyInspection;
  draft: MappingDraft;
  units: UnitSystem;
  errors: FieldErrors;
  busy: boolean;
  update: (change: (d: MappingDraft) => MappingDraft) => void;
  onDialect: (dialect: Partial<CsvDialect>) => void;
  onSubmit: () => void;
}

/** Shows what was guessed about the file and lets the user correct it before it is read. */
export function MappingStep({
  fileName,
  inspection,
  draft,
  units,
  errors,
  busy,
  update,
  onDialect,
  onSubmit,
}: MappingStepProps) {
  const csv = inspection.kind === 'csv' ? inspection : null;
  const submit = (e: FormEvent) => {
    e.preventDefault();
    onSubmit();
  };
  return (
    <form onSubmit={submit} className="space-y-5" noValidate aria-label="Column mapping">
      <div className="grid gap-3 sm:grid-cols-2">
        <TextField
          id="route-name"
          label="Route name"
          value={draft.name}
          onChange={(e) => update((d) => ({ ...d, name: e.target.value }))}
          errors={errors.name}
        />
        {csv ? (
          <label className="block text-sm">
            <span className="font-medium text-creek-900">What the file holds</span>
            <select
              id="survey-format"
              value={draft.format}
              onChange={(e) => update((d) => ({ ...d, format: e.target.value as SurveyFormat }))}
              className="mt-1 block w-full rounded-md border border-creek-200 bg-white px-2 py-2 text-sm"
            >
              {CSV_FORMATS.map((f) => (
                <option key={f} value={f}>
                  {FORMAT_LABELS[f]}
                </option>
              ))}
            </select>
          </label>
        ) : (
          <p className="self-end text-sm text-creek-700">
            “{fileName}” is a GPX file: tracks, track segments, routes and waypoints are read as they are; heights
            (&lt;ele&gt;) are in metres.
          </p>
        )}
      </div>

      {csv && (
        <div className="flex flex-wrap items-end gap-4 rounded-md bg-creek-50/60 p-3 text-sm">
          <label className="block">
            <span className="font-medium text-creek-900">Columns separated by</span>
            <select
              id="delimiter"
              value={draft.dialect.delimiter}
              onChange={(e) =>
                onDialect({ delimiter: e.target.value as CsvDelimiter, hasHeader: draft.dialect.hasHeader })
              }
              className="mt-1 block rounded-md border border-creek-200 bg-white px-2 py-1.5"
            >
              {DELIMITERS.map((d) => (
                <option key={d.label} value={d.value}>
                  {d.label}
                </option>
              ))}
            </select>
          </label>
          <label className="flex items-center gap-2">
            <input
              type="checkbox"
              checked={draft.dialect.hasHeader}
              onChange={(e) => onDialect({ delimiter: draft.dialect.delimiter, hasHeader: e.target.checked })}
            />{' '}
            First row holds column names
          </label>
          <label className="flex items-center gap-2">
            <input
              type="checkbox"
              checked={draft.dialect.decimalComma}
              onChange={(e) => update((d) => ({ ...d, dialect: { ...d.dialect, decimalComma: e.target.checked } }))}
            />{' '}
            Decimal comma (512,4)
          </label>
          <span className="text-xs text-creek-600">
            Line endings: {csv.dialect.lineEnding === 'mixed' ? 'mixed (read as one kind)' : csv.dialect.lineEnding}
          </span>
        </div>
      )}

      {csv && draft.format === 'gps-csv' && <GpsColumns draft={draft} headers={csv.headers} update={update} />}
      {csv && draft.format === 'gps-csv' && draft.gps.mapping.time !== null && (
        <TimeQuestions
          draft={draft}
          ambiguous={sampleDatesAmbiguous(csv.sampleRows, draft.gps.mapping.time)}
          update={update}
        />
      )}
      {csv && draft.format === 'station-csv' && <StationColumns draft={draft} headers={csv.headers} update={update} />}
      {csv && (draft.format === 'inclinometer-csv' || draft.format === 'level-book-csv') && (
        <FieldBookFields draft={draft} units={units} errors={errors} update={update} />
      )}
      {!csv && (
        <div className="flex flex-wrap items-end gap-6">
          <label className="flex items-center gap-2 text-sm">
            <input
              type="checkbox"
              checked={draft.gpx.useWaypointsAsRoute}
              onChange={(e) => update((d) => ({ ...d, gpx: { ...d.gpx, useWaypointsAsRoute: e.target.checked } }))}
            />
            No track? Use the waypoints, in file order, as the route
          </label>
          <div className="w-64">
            <HeightSourceSelect
              id="gpx-height-source"
              value={draft.gpx.heightSource}
              onChange={(v) => update((d) => ({ ...d, gpx: { ...d.gpx, heightSource: v } }))}
            />
          </div>
        </div>
      )}

      {csv && (
        <div>
          <h3 className="mb-1 text-sm font-medium text-creek-900">First rows of “{fileName}”</h3>
          <SampleTable headers={csv.headers} rows={csv.sampleRows} roles={columnRoles(draft)} />
        </div>
      )}

      {Object.keys(errors).length > 0 && (
        <p role="alert" className="text-sm text-clay-700">
          Check the marked fields: {Object.values(errors).flat().join(' ')}
        </p>
      )}
      <Button type="submit" disabled={busy}>
        {busy ? 'Reading…' : 'Read the file with these settings'}
      </Button>
    </form>
  );
}

const ZONES: readonly string[] =
  typeof Intl.supportedValuesOf === 'function' ? Intl.supportedValuesOf('timeZone') : ['UTC'];

/**
 * How the time column is read: the zone of times written without an offset (the project's, so the
 * preview here and the import on the server agree) and, when a date could be either, its order.
 */
function TimeQuestions({
  draft,
  ambiguous,
  update,
}: {
  draft: MappingDraft;
  ambiguous: boolean;
  update: MappingStepProps['update'];
}) {
  const setTimes = (patch: Partial<MappingDraft['times']>) =>
    update((d) => ({ ...d, times: { ...d.times, ...patch } }));
  const zones = ZONES.includes(draft.times.timeZone) ? ZONES : [draft.times.timeZone, ...ZONES];
  return (
    <fieldset className="space-y-3 rounded-md border border-creek-100 p-3 text-sm" data-testid="time-questions">
      <legend className="px-1 font-medium text-creek-900">Times in the file</legend>
      {ambiguous && draft.times.dateOrder === 'ask' && (
        <p
          role="alert"
          className="rounded-md border border-ochre-100 bg-ochre-50 px-3 py-2 text-ochre-700"
          data-testid="ask-date-order"
        >
          The dates in the time column could be read two ways (01.05.2024 is 1 May day first, or 5 January month first).
          Which order does this file use?
        </p>
      )}
      <div className="flex flex-wrap gap-4" role="radiogroup" aria-label="Date order">
        {(
          [
            ['ask', 'Ask me when a date could be either'],
            ['day-first', 'Day first (31.12.2024)'],
            ['month-first', 'Month first (12/31/2024)'],
          ] as const
        ).map(([value, label]) => (
          <label key={value} className="flex items-center gap-2">
            <input
              type="radio"
              name="date-order"
              value={value}
              checked={draft.times.dateOrder === value}
              onChange={() => setTimes({ dateOrder: value })}
            />{' '}
            {label}
          </label>
        ))}
      </div>
      <label className="block max-w-sm">
        <span className="font-medium text-creek-900">Time zone of times without an offset</span>
        <select
          id="time-zone"
          value={draft.times.timeZone}
          onChange={(e) => setTimes({ timeZone: e.target.value })}
          className="mt-1 block w-full rounded-md border border-creek-200 bg-white px-2 py-1.5"
        >
          {zones.map((zone) => (
            <option key={zone} value={zone}>
              {zone}
            </option>
          ))}
        </select>
        <span className="mt-1 block text-xs text-creek-600">
          The project&apos;s time zone unless you change it; a time that carries its own offset (Z, +02:00) keeps it.
        </span>
      </label>
    </fieldset>
  );
}
