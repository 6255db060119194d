import { revisionActionRoute } from '@/lib/api/revision-action-route';

export const POST = revisionActionRoute('approve');
