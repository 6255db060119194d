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

export const routeViewVersion = (updatedAt: Date, profilePoints: number | undefined) => `${updatedAt.toISOString()}|${profilePoints ?? ''}`;

export function cachedRouteView(routeId: string, version: string): RouteView | null {
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

/** Forgets every kept view (the benchmark's cold reads). */
export function forgetRouteViews(): void {
  views.clear();
}
