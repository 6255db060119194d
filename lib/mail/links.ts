import { env } from '../env';

/** Absolute links for mail, on the address the app is served from (NEXTAUTH_URL). */
export function appLink(path: string, query: Record<string, string> = {}): string {
  const url = new URL(path, env().NEXTAUTH_URL);
  for (const [k, v] of Object.entries(query)) url.searchParams.set(k, v);
  return url.toString();
}
