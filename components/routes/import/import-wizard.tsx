'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { FormMessage } from '@/components/ui/form-message';
import { ProgressBar } from '@/components/ui/progress-bar';
import type { FieldErrors } from '@/lib/errors';
import { initialMappingDraft, mappingToOptions, withInspection, type MappingDraft } from '@/lib/import/mapping-draft';
import type { ImportPreview } from '@/lib/import/protocol';
import { ImportProblem, useSurveyWorker } from '@/lib/import/use-survey-worker';
import { useImportSurvey } from '@/lib/queries/routes';
import type { CsvDialect } from '@/lib/survey/csv-dialect';
import type { SurveyInspection } from '@/lib/survey/inspect';
import type { SurveyImportOptions } from '@/lib/validations/survey-import';
import type { UnitSystem } from '@/lib/units';
import { MappingStep } from './mapping-step';
import { PreviewStep } from './preview-step';
import { formatNumber } from '@/lib/units';

type Phase = 'pick' | 'mapping' | 'preview';
interface Progress {
  label: string;
  detail: string;
  fraction: number;
}

export interface ImportWizardProps {
  projectId: string;
  units: UnitSystem;
  /** The project's time zone: times without an offset are read in it, in the preview and the import alike. */
  timeZone?: string | null;
}

/**
 * Import in three steps: pick a file (read and inspected in a worker), check the column mapping
 * against the first rows, preview what was read with its warnings, then save (one upload, one
 * transaction on the server). Nothing is stored until the last step.
 */
export function ImportWizard({ projectId, units, timeZone = null }: ImportWizardProps) {
  const router = useRouter();
  const worker = useSurveyWorker();
  const upload = useImportSurvey(projectId);
  const [phase, setPhase] = useState<Phase>('pick');
  const [file, setFile] = useState<File | null>(null);
  const [inspection, setInspection] = useState<SurveyInspection | null>(null);
  const [draft, setDraft] = useState<MappingDraft | null>(null);
  const [options, setOptions] = useState<SurveyImportOptions | null>(null);
  const [preview, setPreview] = useState<ImportPreview | null>(null);
  const [progress, setProgress] = useState<Progress | null>(null);
  const [busy, setBusy] = useState(false);
  const [errors, setErrors] = useState<FieldErrors>({});
  const [problem, setProblem] = useState<string | null>(null);

  const report = (error: unknown) => setProblem(error instanceof Error ? error.message : 'The file could not be read.');

  async function onFile(chosen: File | undefined) {
    if (!chosen) return;
    setFile(chosen);
    setProblem(null);
    setPreview(null);
    setBusy(true);
    setProgress({ label: 'Reading the file', detail: `Reading “${chosen.name}”`, fraction: 0 });
    try {
      const result = await worker.inspect(chosen, (fraction) =>
        setProgress({ label: 'Reading the file', detail: `Reading “${chosen.name}”`, fraction }),
      );
      setInspection(result.inspection);
      setDraft(initialMappingDraft(result.inspection, chosen.name, timeZone));
      setPhase('mapping');
      setProgress(null);
    } catch (error) {
      setPhase('pick');
      report(error);
    } finally {
      setBusy(false);
    }
  }

  async function onDialect(dialect: Partial<CsvDialect>) {
    try {
      const fresh = await worker.reinspect(dialect);
      setInspection(fresh);
      setDraft((d) => (d ? withInspection(d, fresh) : d));
    } catch (error) {
      report(error);
    }
  }

  async function onRead() {
    if (!draft) return;
    const built = mappingToOptions(draft, units);
    if ('errors' in built) return setErrors(built.errors);
    setErrors({});
    setProblem(null);
    setBusy(true);
    const label = 'Reading rows';
    setProgress({ label, detail: 'Reading rows', fraction: 0 });
    try {
      const result = await worker.parse(built.options, (fraction) =>
        setProgress({ label, detail: 'Reading rows', fraction }),
      );
      setOptions(built.options);
      setPreview(result);
      setProgress({ label, detail: `Read ${formatNumber(result.stats.rowsRead, 0)} rows`, fraction: 1 });
      setPhase('preview');
    } catch (error) {
      setProgress(null);
      if (error instanceof ImportProblem)
        setProblem(`The file could not be read with these settings: ${error.message}`);
      else report(error);
    } finally {
      setBusy(false);
    }
  }

  async function onSave(smooth: boolean) {
    if (!file || !options) return;
    setProblem(null);
    const label = 'Uploading';
    setProgress({ label, detail: 'Uploading and saving', fraction: 0 });
    try {
      const result = await upload.mutateAsync({
        file,
        options,
        onProgress: (fraction) => setProgress({ label, detail: 'Uploading and saving', fraction }),
      });
      router.push(`/projects/${projectId}/routes/${result.route.id}${smooth ? '?propose=smoothing' : ''}`);
    } catch (error) {
      setProgress(null);
      report(error);
    }
  }

  return (
    <div className="space-y-5">
      <div>
        <label htmlFor="survey-file" className="block text-sm font-medium text-creek-900">
          Survey file (CSV or GPX, up to 50 MB)
        </label>
        <input
          id="survey-file"
          type="file"
          accept=".csv,.txt,.tsv,.gpx,text/csv,application/gpx+xml"
          disabled={busy || upload.isPending}
          onChange={(e) => onFile(e.target.files?.[0])}
          className="mt-1 block text-sm file:mr-3 file:rounded-md file:border-0 file:bg-creek-700 file:px-3 file:py-2 file:text-white"
        />
        <p className="mt-1 text-xs text-creek-600">
          Walked tracks from a phone or handheld receiver (CSV or GPX 1.1), station and height tables, clinometer
          traverses and level books. The file is read here first; nothing is saved until you say so.
        </p>
      </div>
      {progress && <ProgressBar label={progress.label} detail={progress.detail} fraction={progress.fraction} />}
      <FormMessage message={problem} />
      {phase !== 'pick' && inspection && draft && file && (
        <section aria-label="Mapping" className={phase === 'preview' ? 'opacity-60' : undefined}>
          <h2 className="mb-2 text-base font-semibold text-creek-900">Check the columns</h2>
          {phase === 'mapping' ? (
            <MappingStep
              fileName={file.name}
              inspection={inspection}
              draft={draft}
              units={units}
              errors={errors}
              busy={busy}
              update={(change) => setDraft((d) => (d ? change(d) : d))}
              onDialect={onDialect}
              onSubmit={onRead}
            />
          ) : (
            <p className="text-sm text-creek-700">
              “{draft.name}” from {file.name}.
            </p>
          )}
        </section>
      )}
      {phase === 'preview' && preview && (
        <section aria-label="Preview">
          <h2 className="mb-2 text-base font-semibold text-creek-900">Preview</h2>
          <PreviewStep
            preview={preview}
            units={units}
            saving={upload.isPending}
            onBack={() => setPhase('mapping')}
            onSave={onSave}
          />
        </section>
      )}
    </div>
  );
}
