import 'server-only';
import { models } from '../../models';
import { enqueueJob } from '../jobs/enqueue';
import type { Project, UnitSystem } from '../../models/project';
import type { DecimalMark } from '../units/typed-number';
import { unitDefaults } from '../units/defaults';
import type { FieldWordTable } from '../validations/field-words';
import type { UpdateProjectInput } from '../validations/projects';
import type { ProjectProgress } from '../projects/next-step';
import { Op, QueryTypes } from 'sequelize';

export interface ProjectSummary {
  id: string;
  teamId: string;
  name: string;
  description: string;
  unitSystem: UnitSystem;
  siteNotes: string;
  /** Depth frost reaches at the site, m; null when not known. */
  frostDepthM: number | null;
  /** Decimal mark for number boxes; null = the browser's locale. */
  decimalMark: DecimalMark | null;
  /** IANA time zone survey times without an offset are read in; null = UTC. */
  timeZone: string | null;
  archived: boolean;
  createdAt: string;
  updatedAt: string;
}

function toSummary(p: Project): ProjectSummary {
  return {
    id: p.id,
    teamId: p.teamId,
    name: p.name,
    description: p.description,
    unitSystem: p.unitSystem,
    siteNotes: p.siteNotes,
    frostDepthM: p.frostDepthM ?? null,
    decimalMark: p.decimalMark ?? null,
    timeZone: p.timeZone ?? null,
    archived: p.archivedAt != null,
    createdAt: p.createdAt.toISOString(),
    updatedAt: p.updatedAt.toISOString(),
  };
}

/** The columns `toSummary` reads, under the model's attribute names. */
const SUMMARY_COLUMNS = [
  'id',
  'team_id AS "teamId"',
  'name',
  'description',
  'unit_system AS "unitSystem"',
  'site_notes AS "siteNotes"',
  'frost_depth_m AS "frostDepthM"',
  'decimal_mark AS "decimalMark"',
  'time_zone AS "timeZone"',
  'archived_at AS "archivedAt"',
  'created_at AS "createdAt"',
  'updated_at AS "updatedAt"',
].join(', ');

export async function listProjects(teamId: string): Promise<ProjectSummary[]> {
  // One fixed statement: a team's list is read on every visit, and building the query and model rows
  // cost more than the read itself (tests/api/sessions-and-teams.test.ts keeps it equal to getProject).
  const rows = await models().sequelize.query<Project>(
    `SELECT ${SUMMARY_COLUMNS} FROM projects WHERE team_id = :teamId ORDER BY updated_at DESC`,
    {
      type: QueryTypes.SELECT,
      replacements: { teamId },
    },
  );
  return rows.map(toSummary);
}

export async function getProject(projectId: string): Promise<ProjectSummary | null> {
  const p = await models().Project.findByPk(projectId);
  return p ? toSummary(p) : null;
}

// The team lookups run first on every request about a project or one of its rows (teamRoute's
// `teamOf`): one fixed statement each, a join rather than two reads.
export async function teamOfProject(projectId: string): Promise<string | null> {
  const [row] = await models().sequelize.query<{ teamId: string }>(
    'SELECT team_id AS "teamId" FROM projects WHERE id = :projectId',
    {
      type: QueryTypes.SELECT,
      replacements: { projectId },
    },
  );
  return row?.teamId ?? null;
}

/** Tables whose rows each belong to one project (a `project_id` column). */
export type ProjectRowTable = 'lines' | 'revisions' | 'site_photos' | 'comments' | 'routes';

/** The team owning a project's row, or null when there is no such row. */
export async function teamOfProjectRow(table: ProjectRowTable, id: string): Promise<string | null> {
  const [row] = await models().sequelize.query<{ teamId: string }>(
    `SELECT p.team_id AS "teamId" FROM ${table} r JOIN projects p ON p.id = r.project_id WHERE r.id = :id`,
    {
      type: QueryTypes.SELECT,
      replacements: { id },
    },
  );
  return row?.teamId ?? null;
}

/** The unit system of a project (metric when it is gone), for wording refusals. */
export async function unitSystemOfProject(projectId: string): Promise<UnitSystem> {
  const project = await models().Project.findByPk(projectId, { attributes: ['unitSystem'] });
  return project?.unitSystem ?? 'metric';
}

/** A route's `bodyWords` for a handler under /projects/[projectId]: refusals worded in that project's units. */
export function inProjectUnits(table: FieldWordTable | ((data: unknown) => FieldWordTable)) {
  return { table, unitsOf: ({ projectId }: { projectId: string }) => unitSystemOfProject(projectId) };
}

export async function createProject(
  teamId: string,
  userId: string,
  input: { name: string; description: string; unitSystem: UnitSystem; siteNotes: string },
): Promise<ProjectSummary> {
  // A US project writes decimals with a point from the start; a metric one follows each browser's language until set.
  const p = await models().Project.create({
    ...input,
    decimalMark: unitDefaults(input.unitSystem).decimalMark,
    teamId,
    createdBy: userId,
  });
  return toSummary(p);
}

export async function updateProject(projectId: string, input: UpdateProjectInput): Promise<ProjectSummary> {
  const { Project: P, sequelize } = models();
  return sequelize.transaction(async (transaction) => {
    const p = await P.findByPk(projectId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!p) throw new Error(`project ${projectId} vanished during update`);
    const { archived, ...fields } = input;
    p.set(fields);
    if (archived !== undefined) p.archivedAt = archived ? (p.archivedAt ?? new Date()) : null;
    await p.save({ transaction });
    return toSummary(p);
  });
}

/**
 * Deletes the project and everything in it. Its stored files go by a job queued in the same
 * transaction: the job exists exactly when the delete committed, and retries until the files are gone.
 */
export async function deleteProject(projectId: string): Promise<void> {
  const { Project, sequelize } = models();
  await sequelize.transaction(async (transaction) => {
    await Project.destroy({ where: { id: projectId }, transaction });
    await enqueueJob(transaction, 'delete-project-files', { projectId });
  });
}

/** Counts for the overview's next step: routes, routes a line can be laid on, lines. */
export async function projectProgress(projectId: string): Promise<ProjectProgress> {
  const { Route, Line } = models();
  const [routes, surveyedRoutes, lines] = await Promise.all([
    Route.count({ where: { projectId } }),
    Route.count({ where: { projectId, pointCount: { [Op.gte]: 2 } } }),
    Line.count({ where: { projectId } }),
  ]);
  return { routes, surveyedRoutes, lines };
}
