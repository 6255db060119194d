import type { Actor } from '../support/api';
import type { Cast } from './cast';
import { serverActionId } from './discover';
import { BASE, live } from './live';

export interface ActionAnswer {
  status: number;
  /** 'ok', or the refusal's code. */
  result: string;
  payload: unknown;
  text: string;
}

/** The value an action returned, from the RSC answer (`<row>:<json>` lines). */
function returnedValue(text: string): { ok?: boolean; code?: string } | null {
  for (const line of text.split('\n')) {
    const m = /^[0-9a-f]+:(\{.*\})$/.exec(line.trim());
    if (!m) continue;
    try {
      const value = JSON.parse(m[1]!) as Record<string, unknown>;
      if ('ok' in value) return value as { ok?: boolean; code?: string };
    } catch {
      // another kind of row
    }
  }
  return null;
}

/** Calls a server action over HTTP as the browser does (Next-Action header, arguments as JSON). */
export async function callServerAction(
  cast: Cast,
  actor: Actor,
  file: string,
  exportName: string,
  ...args: unknown[]
): Promise<ActionAnswer> {
  const headers: Record<string, string> = {
    'next-action': serverActionId(file, exportName),
    'content-type': 'text/plain;charset=UTF-8',
    accept: 'text/x-component',
    origin: BASE(),
  };
  const cookie = cast.cookies[actor];
  if (cookie) headers.cookie = cookie;
  // A public page that uses the action (the signed-in areas redirect an anonymous caller first).
  const res = await live('/invitations/accept', { method: 'POST', headers, body: JSON.stringify(args) });
  const value = returnedValue(res.text);
  return {
    status: res.status,
    result: value ? (value.ok ? 'ok' : (value.code ?? 'unknown')) : `no result (${res.status})`,
    payload: value,
    text: res.text,
  };
}
