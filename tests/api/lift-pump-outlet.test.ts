import { describe, expect, it } from 'vitest';
import { pumpOutletHeadForProject } from '@/lib/data/ram-sites';
import { createTeamFixture } from '../support/api';
import { createRamSiteFixture } from '../support/lift-fixtures';

describe('pumpOutletHeadForProject (read by the line designer)', () => {
  it('gives each ram site its working head at the pump outlet: lift plus delivery friction', async () => {
    const f = await createTeamFixture();
    const site = await createRamSiteFixture(f.projectId, f.users.owner.id);
    const [outlet] = await pumpOutletHeadForProject(f.projectId);
    expect(outlet.ramSiteId).toBe(site.id);
    expect(outlet.workingHeadM).toBeCloseTo(outlet.liftM + outlet.deliveryFrictionM, 12);
    expect(outlet.liftM).toBe(10.7);
    expect(outlet.peakHeadAtPumpM).toBeGreaterThan(outlet.workingHeadM);
    expect(outlet.caution).toMatch(/licensed practice/);
  });

  it('is empty for a project with no ram site', async () => {
    const f = await createTeamFixture();
    expect(await pumpOutletHeadForProject(f.projectId)).toEqual([]);
  });
});
