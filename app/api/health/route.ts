import { publicRoute } from '@/lib/api/route';

/** Liveness: the process is up and answering. Touches nothing else (the load balancer polls it). */
export const GET = publicRoute({}, async () => ({ status: 'ok', uptimeSeconds: Math.round(process.uptime()) }));
