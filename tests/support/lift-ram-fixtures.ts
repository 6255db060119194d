import { addCommissioningReading } from '@/lib/data/ram-commissioning';
import { createRamSite } from '@/lib/data/ram-sites';
import { CommissioningReadingSchema, RamSiteSchema } from '@/lib/validations/ram-sites';

const L_PER_MIN = 1e-3 / 60;

/** A small creek ram: 2 m fall, 20 L/min, 1¼-in steel drive 14 m, ¾-in steel delivery 107 m up 10.7 m. */
export const ramSiteBody = () => ({
  name: 'Fixture ram',
  driveFlowM3s: 20 * L_PER_MIN,
  fallM: 2,
  drivePipe: { lengthM: 14, insideDiameterM: 0.03505, material: 'steel' },
  liftM: 10.7,
  deliveryPipe: { lengthM: 107, insideDiameterM: 0.02093, hazenWilliamsC: 150, pressureRatingPa: 689_476 },
  pumpCount: 1,
});

/** Readings at that ram: 60 beats, 10 L at the top in 4 min, 10 L at the waste valve in 30 s, gauge 11 m. */
export const commissioningBody = () => ({
  measuredOn: '2026-09-12',
  beatsPerMinute: 60,
  deliveredBucketVolumeM3: 0.01,
  deliveredBucketSeconds: 240,
  driveMeasure: 'waste',
  driveBucketVolumeM3: 0.01,
  driveBucketSeconds: 30,
  supplyHeadM: 2,
  deliveryHeadM: 11,
  notes: 'after priming',
});

export async function createRamSiteFixture(projectId: string, userId: string) {
  return (await createRamSite(projectId, userId, RamSiteSchema.parse(ramSiteBody()))).ramSite;
}

export async function createCommissioningFixture(projectId: string, userId: string) {
  const site = await createRamSiteFixture(projectId, userId);
  const { reading } = await addCommissioningReading(
    projectId,
    site.id,
    userId,
    CommissioningReadingSchema.parse(commissioningBody()),
  );
  return { site, reading };
}
