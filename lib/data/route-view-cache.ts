import 'server-only';
import type { RouteView } from '../routes/types';

/** Routes whose view this process keeps: the few being worked on. */
const MAX_ROUTES = 16;

/**
 * Route views this process worked out, by route and by the saved version they show (the route's
 * `updatedAt`, which every write of its points, name or clean-up moves on) and the thinning asked
 * for. A view of an older version is never answered. Each instance keeps its own; the cost of a miss
 * is one read of the points (`route-read-100k` prints both).
 */
const views = new Map<string, { version: string; view: RouteView }>();

export const routeViewVersion = (updatedAt: Date, profilePoints: number | undefined) =>
  `${updatedAt.toISOString()}|${profilePoints ?? ''}`;

function cachedRouteView(routeId: string, version: string): RouteView | null {
  const entry = views.get(routeId);
  if (!entry || entry.version !== version) return null;
  // Map order is the order of use: the least recently used route goes first.
  views.delete(routeId);
  views.set(routeId, entry);
  return entry.view;
}

export function keepRouteView(routeId: string, version: string, view: RouteView): void {
  views.delete(routeId);
  views.set(routeId, { version, view });
  while (views.size > MAX_ROUTES) views.delete(views.keys().next().value as string);
}

const working = new Map<string, Promise<RouteView | null>>();

/**
 * The view of this saved version, kept, being worked out (the import's warm-up and a first visit
 * at once share the one read), or worked out now by `compute`.
 */
export function sharedRouteView(
  routeId: string,
  version: string,
  compute: () => Promise<RouteView | null>,
): Promise<RouteView | null> {
  const kept = cachedRouteView(routeId, version);
  if (kept) return Promise.resolve(kept);
  const key = `${routeId}|${version}`;
  const running = working.get(key);
  if (running) return running;
  const started = compute().finally(() => working.delete(key));
  working.set(key, started);
  return started;
}

/** Forgets every kept view (the benchmark's cold reads). */
export function forgetRouteViews(): void {
  views.clear();
}
