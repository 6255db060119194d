import fs from 'node:fs';
import { z } from 'zod';
import { env } from './env';

/**
 * A seam for the live fault tests, alive only with RUNNEL_ENV=test and RUNNEL_STORAGE_FAULTS set:
 * before each storage call the file it names is read; `{ "match": "<part of the key>", "op":
 * "put" | "get" | "delete" | "list", "nth": 2 }` fails the 2nd such call on a matching key (counted
 * from when the file last changed), as if the store had dropped the connection. No file, no fault.
 */
export type StorageOp = 'put' | 'get' | 'delete' | 'list';

const FaultPlan = z.strictObject({
  match: z.string().min(1).max(500),
  op: z.enum(['put', 'get', 'delete', 'list']),
  nth: z.number().int().min(1).max(1000),
});

export class InjectedStorageFault extends Error {
  constructor(op: StorageOp, key: string) {
    super(`injected storage fault: ${op} ${key}`);
    this.name = 'InjectedStorageFault';
  }
}

let seen: { text: string; count: number } | undefined;

/** Throws when the test's plan says this call fails; does nothing outside the test environment. */
export function checkStorageFault(op: StorageOp, key: string): void {
  const e = env();
  if (e.RUNNEL_ENV !== 'test' || !e.RUNNEL_STORAGE_FAULTS) return;
  let text: string;
  try {
    text = fs.readFileSync(e.RUNNEL_STORAGE_FAULTS, 'utf8');
  } catch {
    return;
  }
  if (seen?.text !== text) seen = { text, count: 0 };
  const plan = FaultPlan.safeParse(JSON.parse(text || 'null'));
  if (!plan.success || plan.data.op !== op || !key.includes(plan.data.match)) return;
  seen.count += 1;
  if (seen.count === plan.data.nth) throw new InjectedStorageFault(op, key);
}
