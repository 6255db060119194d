// Checks the environment with the app's own rules (lib/env.ts) before `npm start` sets anything
// up, so production refuses to start with a message naming every missing or unsafe setting.
import { env } from '../lib/env';

try {
  console.log(`[runnel] settings checked (RUNNEL_ENV=${env().RUNNEL_ENV})`);
} catch (error) {
  console.error(`[runnel] ${(error as Error).message.replaceAll('; ', '\n[runnel]   ')}`);
  process.exit(1);
}
