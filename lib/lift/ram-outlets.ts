import { pumpOutletHeadOf, type PumpOutletHead } from './pump-outlet';
import { planRamSite } from './ram-plan';
import type { LiftRecords } from './records';

/**
 * The pump outlet of each plannable ram site: what a delivery line or a ram-outlet node of the
 * network reads. Plans only the ram sites (no yields, demand or storage).
 */
export function ramOutletsOf(records: Pick<LiftRecords, 'ramSites' | 'tanks' | 'routes'>): PumpOutletHead[] {
  return records.ramSites.flatMap((site) => {
    const tank = site.tankId ? (records.tanks.find((candidate) => candidate.id === site.tankId) ?? null) : null;
    const plan = planRamSite(site, { routes: records.routes, tankVolumeM3: tank?.volumeM3 ?? null });
    return plan.ok ? [pumpOutletHeadOf(site, tank, plan.value)] : [];
  });
}
