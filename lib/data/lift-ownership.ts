import 'server-only';
import type { Model, ModelStatic, Transaction } from 'sequelize';
import { models } from '../../models';
import { notInProject } from '../errors';

type Owned = 'WaterSource' | 'Tank' | 'RamSite' | 'Route' | 'DemandUse' | 'SeasonalTask' | 'Line' | 'NetworkNode';

/** Whether a row of a project-owned table exists and belongs to the project. */
export async function existsInProject(
  model: Owned,
  id: string,
  projectId: string,
  transaction?: Transaction,
): Promise<boolean> {
  const table = models()[model] as ModelStatic<Model>;
  return (await table.count({ where: { id, projectId }, transaction })) > 0;
}

/**
 * Refuses (404 like an id in the address, nothing written) a body that names a record of another
 * project or one that does not exist: the field is named so the form can show it.
 */
export async function assertReferences(
  projectId: string,
  references: { field: string; model: Owned; id: string | null; label: string }[],
  transaction?: Transaction,
): Promise<void> {
  const fields: Record<string, string[]> = {};
  for (const reference of references) {
    if (reference.id === null) continue;
    if (!(await existsInProject(reference.model, reference.id, projectId, transaction))) {
      fields[reference.field] = [`${reference.label} is not part of this project`];
    }
  }
  if (Object.keys(fields).length > 0) throw notInProject(fields);
}
