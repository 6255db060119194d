import { runBenchmark, type Benchmark } from './harness';

/** The registry: name -> a loader, so running one benchmark builds only its own data. */
const REGISTRY: Record<string, () => Promise<Benchmark>> = {
  'profile-100k': async () => (await import('./profile-100k')).profile100k,
  'profile-100k-dw': async () => (await import('./profile-100k')).profile100kDw,
  'profile-100k-results': async () => (await import('./profile-100k')).profile100kResults,
  'line-5k': async () => (await import('./line-5k')).line5k,
  'line-5k-draw': async () => (await import('./line-5k')).line5kDraw,
  'draw-100k': async () => (await import('./line-5k')).draw100k,
  'lift-summary': async () => (await import('./lift-summary')).liftSummary,
  'ram-plan-preview': async () => (await import('./lift-summary')).ramPlanPreview,
  'sizing-500': async () => (await import('./network-sizing')).sizing500,
  'day-1k': async () => (await import('./network-sizing')).day1k,
  'network-10k': async () => (await import('./network-10k')).network10k,
  'survey-import-100k': async () => (await import('./survey-import-100k')).surveyImport100k(),
  'route-read-100k': async () => (await import('./route-read-100k')).routeRead100k(),
  'api-capacity-50': async () => (await import('./api-load')).apiCapacity50,
  'api-latency-50u': async () => (await import('./api-load')).apiLatency50u,
  'api-list-cost': async () => (await import('./api-load')).apiListCost,
};

async function main(): Promise<void> {
  const wanted = process.argv.slice(2);
  const unknown = wanted.filter((name) => !(name in REGISTRY));
  if (unknown.length > 0) {
    console.error(`Unknown benchmark: ${unknown.join(', ')}. Known: ${Object.keys(REGISTRY).join(', ')}`);
    process.exitCode = 1;
    return;
  }
  const names = wanted.length > 0 ? wanted : Object.keys(REGISTRY);
  for (const name of names) console.log(await runBenchmark(await REGISTRY[name]()));
}

void main();
