'use client';

import { useCallback, useEffect, useRef } from 'react';
import { MAX_SURVEY_FILE_BYTES } from '../survey/sniff';
import type { CsvDialect } from '../survey/csv-dialect';
import type { SurveyInspection } from '../survey/inspect';
import type { SurveyImportOptions } from '../validations/survey-import';
import type { ImportFailure, ImportPreview, WorkerRequest, WorkerResponse } from './protocol';

/** A refusal from the worker (or from the size check before it), with where in the file. */
export class ImportProblem extends Error {
  constructor(readonly failure: ImportFailure) {
    super(failure.message);
    this.name = 'ImportProblem';
  }
}

/** Reads a File into memory, reporting progress as it goes (large files take a moment). */
function readWithProgress(file: File, onProgress: (fraction: number) => void): Promise<ArrayBuffer> {
  return new Promise((resolve, reject) => {
    const reader = new FileReader();
    reader.onprogress = (e) => {
      if (e.lengthComputable && e.total > 0) onProgress(e.loaded / e.total);
    };
    reader.onload = () => resolve(reader.result as ArrayBuffer);
    reader.onerror = () =>
      reject(new ImportProblem({ code: 'unexpected', message: `the browser could not read “${file.name}”` }));
    reader.readAsArrayBuffer(file);
  });
}

/**
 * The import screen's handle on its worker: `inspect` a chosen file (dialect, headers, guessed
 * mapping), then `parse` it with the options chosen, with progress. One worker per screen.
 */
export function useSurveyWorker() {
  const worker = useRef<Worker | null>(null);
  const nextId = useRef(1);

  useEffect(() => () => worker.current?.terminate(), []);

  const send = useCallback(
    <T extends WorkerResponse['type']>(
      request: WorkerRequest,
      expect: T,
      onProgress?: (f: number) => void,
      transfer: Transferable[] = [],
    ) => {
      worker.current ??= new Worker(new URL('./survey.worker.ts', import.meta.url));
      const w = worker.current;
      return new Promise<Extract<WorkerResponse, { type: T }>>((resolve, reject) => {
        const listener = (event: MessageEvent<WorkerResponse>) => {
          const m = event.data;
          if (m.id !== request.id) return;
          if (m.type === 'progress') return onProgress?.(m.fraction);
          w.removeEventListener('message', listener);
          if (m.type === 'failed') reject(new ImportProblem(m.error));
          else if (m.type === expect) resolve(m as Extract<WorkerResponse, { type: T }>);
        };
        w.addEventListener('message', listener);
        w.postMessage(request, transfer);
      });
    },
    [],
  );

  const inspect = useCallback(
    async (
      file: File,
      onReadProgress: (fraction: number) => void,
    ): Promise<{ inspection: SurveyInspection; hadByteOrderMark: boolean }> => {
      if (file.size > MAX_SURVEY_FILE_BYTES) {
        const mb = (n: number) => (n / (1024 * 1024)).toFixed(1);
        throw new ImportProblem({
          code: 'file-too-large',
          message: `the file “${file.name}” is ${mb(file.size)} MB; the limit is ${mb(MAX_SURVEY_FILE_BYTES)} MB`,
        });
      }
      const bytes = await readWithProgress(file, onReadProgress);
      const id = nextId.current++;
      const m = await send({ type: 'inspect', id, bytes, fileName: file.name }, 'inspected', undefined, [bytes]);
      return { inspection: m.inspection, hadByteOrderMark: m.hadByteOrderMark };
    },
    [send],
  );

  const reinspect = useCallback(
    async (dialect: Partial<CsvDialect>): Promise<SurveyInspection> => {
      const id = nextId.current++;
      return (await send({ type: 'reinspect', id, dialect }, 'inspected')).inspection;
    },
    [send],
  );

  const parse = useCallback(
    async (options: SurveyImportOptions, onProgress: (fraction: number) => void): Promise<ImportPreview> => {
      const id = nextId.current++;
      return (await send({ type: 'parse', id, options }, 'parsed', onProgress)).preview;
    },
    [send],
  );

  return { inspect, reinspect, parse };
}
