import { importSurvey } from '@/lib/data/route-import';

/** A small station/elevation survey every route fixture is imported from. */
export const FIXTURE_STATIONS_CSV =
  'chainage,elevation,name\n0,412.0,Spring box\n40,409.5,\n80,431.0,\n120,404.8,Gate\n160,401.2,Trough\n';

/**
 * Two imported routes of a project (with their original file in object storage), so the route
 * endpoints have something to read, edit, split, join and download. The first has a spike at 80 m.
 */
export async function createRouteFixtures(
  projectId: string,
  userId: string,
): Promise<{ routeId: string; otherRouteId: string }> {
  const bytes = new TextEncoder().encode(FIXTURE_STATIONS_CSV);
  const options = {
    format: 'station-csv' as const,
    mapping: { chainage: 0, elevation: 1, name: 2 },
    chainageUnit: 'm' as const,
    elevationUnit: 'm' as const,
    heightSource: 'level' as const,
  };
  const first = await importSurvey({
    projectId,
    userId,
    fileName: 'fixture-stations.csv',
    contentType: 'text/csv',
    bytes,
    options: { ...options, name: 'Fixture spring to gate' },
  });
  const other = await importSurvey({
    projectId,
    userId,
    fileName: 'fixture-stations.csv',
    contentType: 'text/csv',
    bytes,
    options: { ...options, name: 'Fixture gate to tank' },
  });
  return { routeId: first.route.id, otherRouteId: other.route.id };
}
