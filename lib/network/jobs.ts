import type { NetworkRunResult } from './run-result';

export type NetworkRunKind = 'solve' | 'day' | 'size';

/** A run of the network as the page polls it. */
export interface NetworkJobView {
  id: string;
  kind: NetworkRunKind;
  status: 'queued' | 'running' | 'done' | 'failed';
  /** 0..1 */
  progress: number;
  stage: string;
  result: NetworkRunResult | null;
  error: { message: string; element?: string } | null;
  createdAt: string;
  finishedAt: string | null;
}
