import { createHash } from 'node:crypto';
import { analyzeLine } from '../../hydraulics/index';
import { surveyRows } from '../data/route-points-copy';
import type { LineInput } from '../../hydraulics/index';
import { thinAnalysis } from '../lines/thin-analysis';
import { decodeHeic } from '../photos/decode-heic';
import type { NetworkContext } from '../network/context';
import { dayNetworkRun, sizeNetworkRun, solveNetworkRun, tankStorageRun } from '../network/run-network';
import { parseSurveyText } from '../survey/run-import';
import { sniffSurveyFile } from '../survey/sniff';
import type { SurveyImportOptions } from '../validations/survey-import';

/**
 * The CPU-heavy jobs that run in the worker pool (lib/workers/pool.ts), by name. Each takes and
 * returns plain structured-cloneable data. To add one: write a pure function here, add it to
 * TASKS; callers use `runInWorker('<name>', input)`. Keep imports free of `server-only` and of
 * models or the database: a worker thread has neither.
 */
export const TASKS = {
  /**
   * Sniffs and parses an uploaded survey file with the chosen import options, and writes its points
   * as the rows of route `routeId` in COPY text: the request thread gets one buffer to stream to
   * the database, not 100,000 objects to copy across threads and convert again. Also the file's
   * SHA-256, so the request thread does not hash it either.
   */
  'survey.parse': (input: { bytes: Uint8Array; fileName: string; options: SurveyImportOptions; routeId: string }) => {
    const { text } = sniffSurveyFile(input.bytes, { fileName: input.fileName });
    const { points, ...outline } = parseSurveyText(text, input.options);
    return {
      survey: outline,
      rows: surveyRows(input.routeId, points),
      sha256: createHash('sha256').update(input.bytes).digest('hex'),
    };
  },
  /** Analyses a whole line (the core's analyzeLine); `profilePoints` thins the profile for drawing. */
  'line.analyse': (input: { line: LineInput; profilePoints?: number }) => {
    const analysis = analyzeLine(input.line);
    return input.profilePoints === undefined ? analysis : thinAnalysis(analysis, input.profilePoints);
  },
  /** Solves a project's network at the peak hour (lib/network). */
  'network.solve': (input: NetworkContext) => solveNetworkRun(input),
  /** A 24-hour day of the network in hourly steps. */
  'network.day': (input: NetworkContext) => dayNetworkRun(input),
  /** Each tank's storage from the outlets it serves (the Lift & storage page). */
  'network.tank-storage': (input: NetworkContext) => tankStorageRun(input),
  /** Least-cost pipe sizes from the team's price list (HiGHS, loaded in the worker). */
  'network.size': (input: { context: NetworkContext; onePipePerLink: boolean; timeLimitS: number }) =>
    sizeNetworkRun(input.context, input),
  /** Decodes a HEIC photo's picture to RGBA pixels (libheif as WebAssembly: CPU-bound, so off the request thread). */
  'photo.decode-heic': (input: { bytes: Uint8Array; maxPixels: number }) => decodeHeic(input.bytes, input.maxPixels),
  /** For the pool's own tests: burns CPU for `ms` milliseconds, then answers. */
  'test.spin': (input: { ms: number; answer: number }) => {
    const end = Date.now() + input.ms;
    while (Date.now() < end) {
      // busy on purpose: a stand-in for a slow parse
    }
    return input.answer;
  },
  /** For the pool's own tests: throws the error named. */
  'test.fail': (input: { message: string }) => {
    throw new Error(input.message);
  },
} as const;

export type TaskName = keyof typeof TASKS;
export type TaskInput<K extends TaskName> = Parameters<(typeof TASKS)[K]>[0];
export type TaskOutput<K extends TaskName> = ReturnType<(typeof TASKS)[K]>;
