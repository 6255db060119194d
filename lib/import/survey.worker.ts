/// <reference lib="webworker" />
// Parses survey files off the main thread so a long file never freezes the page; progress is
// posted from the CSV parser's cursor. The file's text stays here between inspect and parse.
import { sniffSurveyFile } from '../survey/sniff';
import { inspectSurveyText } from '../survey/inspect';
import { parseSurveyText } from '../survey/run-import';
import { SurveyImportError } from '../survey/errors';
import { buildImportPreview } from './preview';
import type { ImportFailure, WorkerRequest, WorkerResponse } from './protocol';

const scope = self as unknown as DedicatedWorkerGlobalScope;
let text = '';
let hadByteOrderMark = false;

function failure(error: unknown): ImportFailure {
  if (error instanceof SurveyImportError)
    return { code: error.code, message: error.message, line: error.line, column: error.column };
  return { code: 'unexpected', message: error instanceof Error ? error.message : 'the file could not be read' };
}

const post = (message: WorkerResponse) => scope.postMessage(message);

scope.onmessage = (event: MessageEvent<WorkerRequest>) => {
  const request = event.data;
  try {
    if (request.type === 'inspect') {
      const sniffed = sniffSurveyFile(new Uint8Array(request.bytes), { fileName: request.fileName });
      text = sniffed.text;
      hadByteOrderMark = sniffed.hadByteOrderMark;
      post({ type: 'inspected', id: request.id, inspection: inspectSurveyText(text), hadByteOrderMark });
      return;
    }
    if (request.type === 'reinspect') {
      post({
        type: 'inspected',
        id: request.id,
        inspection: inspectSurveyText(text, request.dialect),
        hadByteOrderMark,
      });
      return;
    }
    const survey = parseSurveyText(text, request.options, (fraction) =>
      post({ type: 'progress', id: request.id, fraction }),
    );
    post({ type: 'progress', id: request.id, fraction: 1 });
    post({ type: 'parsed', id: request.id, preview: buildImportPreview(survey) });
  } catch (error) {
    post({ type: 'failed', id: request.id, error: failure(error) });
  }
};
