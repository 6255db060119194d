import 'server-only';
import { linkLineIntoNetwork, rejoinLineStart } from '../../migrations/support/network-from-records.cjs';
import type { Transaction } from 'sequelize';
import { assertLineInput, HydraulicsInputError } from '../../hydraulics/index';
import { models } from '../../models';
import { teamOfProjectRow } from './projects';
import { recordActivity } from '../activity/record';
import type { Line } from '../../models/line';
import { AppError, notFound, notInProject } from '../errors';
import { startingDesign } from '../lines/default-design';
import type { UnitSystem } from '../units/index';
import { lineInputOf } from '../lines/line-input';
import type { LineSiteContext } from '../lines/ram-start';
import { lineStationsOf, type ChainageWindow, type LineRouteStation } from '../lines/route-stations';
import type { LineDesign } from '../validations/line-design';
import type { CreateLineInput, UpdateLineInput } from '../validations/lines';
import { assertRamSiteInProject, lineSiteContext } from './line-context';
import { routeColumns, routeOwner } from './line-routes';
import { lineDesignRefusal } from '../api/domain-errors';

/** A line as the API and pages see it (SI units; the design as the core reads it). */
export interface LineRecord {
  id: string;
  projectId: string;
  routeId: string | null;
  routeName: string | null;
  name: string;
  notes: string;
  fromChainageM: number | null;
  toChainageM: number | null;
  /** Save counter of the working copy (409 on a stale save); review revisions are in lib/data/revisions.ts. */
  revision: number;
  /** Name of whoever saved last. */
  preparedBy: string | null;
  design: LineDesign;
  createdAt: string;
  updatedAt: string;
}

export type LineSummary = Omit<LineRecord, 'design' | 'notes'> & { stretchCount: number; deviceCount: number };

function designOf(line: Line): LineDesign {
  return {
    start: line.startCondition,
    end: line.endCondition,
    flow: line.flow,
    stretches: line.stretches,
    fittings: line.fittings,
    devices: line.devices,
    pipes: line.pipes,
    settings: line.settings,
    ...(line.winter ? { winter: line.winter } : {}),
  } as LineDesign;
}

function columnsOf(design: LineDesign) {
  return {
    startCondition: design.start,
    endCondition: design.end,
    flow: design.flow,
    stretches: design.stretches,
    fittings: design.fittings,
    devices: design.devices,
    pipes: design.pipes,
    settings: design.settings,
    winter: design.winter ?? null,
  } as Pick<
    Line,
    'startCondition' | 'endCondition' | 'flow' | 'stretches' | 'fittings' | 'devices' | 'pipes' | 'settings' | 'winter'
  >;
}

async function names(ids: (string | null)[], transaction?: Transaction): Promise<Map<string, string>> {
  const wanted = [...new Set(ids.filter((id): id is string => id != null))];
  if (wanted.length === 0) return new Map();
  const users = await models().User.findAll({ attributes: ['id', 'name'], where: { id: wanted }, transaction });
  return new Map(users.map((u) => [u.id, u.name]));
}

async function routeNames(ids: (string | null)[], transaction?: Transaction): Promise<Map<string, string>> {
  const wanted = [...new Set(ids.filter((id): id is string => id != null))];
  if (wanted.length === 0) return new Map();
  const routes = await models().Route.findAll({ attributes: ['id', 'name'], where: { id: wanted }, transaction });
  return new Map(routes.map((r) => [r.id, r.name]));
}

function toRecord(line: Line, people: Map<string, string>, routes: Map<string, string>): LineRecord {
  return {
    id: line.id,
    projectId: line.projectId,
    routeId: line.routeId,
    routeName: line.routeId ? (routes.get(line.routeId) ?? null) : null,
    name: line.name,
    notes: line.notes,
    fromChainageM: line.fromChainageM,
    toChainageM: line.toChainageM,
    revision: line.revision,
    preparedBy: line.updatedBy ? (people.get(line.updatedBy) ?? null) : null,
    design: designOf(line),
    createdAt: line.createdAt.toISOString(),
    updatedAt: line.updatedAt.toISOString(),
  };
}

async function recordOf(line: Line, transaction?: Transaction): Promise<LineRecord> {
  return toRecord(line, await names([line.updatedBy], transaction), await routeNames([line.routeId], transaction));
}

export async function teamOfLine(lineId: string): Promise<string | null> {
  return teamOfProjectRow('lines', lineId);
}

/** The unit system of a line's project (metric when the line is gone), for wording refusals. */
export async function unitSystemOfLine(lineId: string): Promise<UnitSystem> {
  const { Line: L, Project } = models();
  const line = await L.findByPk(lineId, { attributes: ['projectId'] });
  const project = line ? await Project.findByPk(line.projectId, { attributes: ['unitSystem'] }) : null;
  return project?.unitSystem ?? 'metric';
}

export async function listLines(projectId: string): Promise<LineSummary[]> {
  const rows = await models().Line.findAll({ where: { projectId }, order: [['name', 'ASC']] });
  const people = await names(rows.map((r) => r.updatedBy));
  const routes = await routeNames(rows.map((r) => r.routeId));
  return rows.map((row) => {
    const record: Partial<LineRecord> = toRecord(row, people, routes);
    const { design } = record as LineRecord;
    delete record.design;
    delete record.notes;
    return {
      ...(record as Omit<LineRecord, 'design' | 'notes'>),
      stretchCount: design.stretches.length,
      deviceCount: design.devices.length,
    };
  });
}

export async function getLine(lineId: string): Promise<LineRecord | null> {
  const line = await models().Line.findByPk(lineId);
  return line ? recordOf(line) : null;
}

/** The stations a line follows (route cut to its window), with map positions where known. */
export async function stationsOfLine(routeId: string, window: ChainageWindow): Promise<LineRouteStation[]> {
  const columns = await routeColumns(routeId);
  if (columns.chainageM.length < 2)
    throw new AppError('bad_request', 'The route has fewer than two stations', {
      routeId: ['Survey at least two stations on this route first'],
    });
  const first = columns.chainageM[0];
  const last = columns.chainageM[columns.chainageM.length - 1];
  const from = window.fromChainageM ?? first;
  const to = window.toChainageM ?? last;
  if (from < first || to > last || from >= to) {
    throw new AppError('bad_request', `The window must lie inside the route (${first} m to ${last} m)`, {
      fromChainageM: [`Pick a window between ${first} m and ${last} m, start before end`],
    });
  }
  return lineStationsOf(columns, window);
}

/** Runs the core's whole-line check; its complaint becomes a 400 naming the design field. */
function assertDesignFits(design: LineDesign, stations: readonly LineRouteStation[], context: LineSiteContext): void {
  try {
    assertLineInput(lineInputOf(design, stations, context));
  } catch (error) {
    if (!(error instanceof HydraulicsInputError)) throw error;
    throw lineDesignRefusal(error, context.unitSystem ?? 'metric', 'design.');
  }
}

async function assertRouteInProject(routeId: string, projectId: string): Promise<void> {
  const owner = await routeOwner(routeId);
  if (!owner || owner.projectId !== projectId) {
    throw notInProject({ routeId: ['Pick a route of this project'] }, 'That route is not part of this project');
  }
}

export async function createLine(
  projectId: string,
  userId: string,
  input: CreateLineInput & { notes: string },
): Promise<LineRecord> {
  await assertRouteInProject(input.routeId, projectId);
  const window = { fromChainageM: input.fromChainageM ?? null, toChainageM: input.toChainageM ?? null };
  const stations = await stationsOfLine(input.routeId, window);
  const context = await lineSiteContext(projectId);
  const design = (input.design as LineDesign | undefined) ?? startingDesign(stations, context.unitSystem ?? 'metric');
  await assertRamSiteInProject(design, projectId);
  assertDesignFits(design, stations, context);
  const { Line: L, sequelize } = models();
  return sequelize.transaction(async (transaction) => {
    const line = await L.create(
      {
        projectId,
        routeId: input.routeId,
        name: input.name,
        notes: input.notes,
        ...window,
        ...columnsOf(design),
        createdBy: userId,
        updatedBy: userId,
      },
      { transaction },
    );
    // Every line is a link of its project's network from the moment it exists.
    await linkLineIntoNetwork(sequelize, transaction, line.id);
    await recordActivity(transaction, {
      projectId,
      actorUserId: userId,
      kind: 'line.created',
      subjectType: 'line',
      subjectId: line.id,
      summary: `Started line "${line.name}"`,
    });
    return recordOf(line, transaction);
  });
}

/** "Spring line" -> "Spring line (copy)", then "(copy 2)", … : the first name no line of the project has. */
export function copyNameOf(name: string, taken: ReadonlySet<string>): string {
  const base = name.replace(/ \(copy(?: \d+)?\)$/, '');
  for (let n = 1; ; n += 1) {
    const candidate = `${base} (copy${n === 1 ? '' : ` ${n}`})`.slice(0, 120);
    if (!taken.has(candidate)) return candidate;
  }
}

/**
 * A copy of a line on the same route and window, with its stretches, fittings, devices, custom pipes
 * and settings, under a new name; it joins the network with ends of its own, like any new line.
 * One transaction: the copy and its network link are made together or not at all.
 */
export async function duplicateLine(lineId: string, userId: string, name?: string): Promise<LineRecord> {
  const { Line: L, sequelize } = models();
  return sequelize.transaction(async (transaction) => {
    const line = await L.findByPk(lineId, { transaction, lock: transaction.LOCK.SHARE });
    if (!line) throw notFound();
    if (!line.routeId)
      throw new AppError('bad_request', 'This line has lost its route; pick a route for it before copying it', {
        routeId: ['Pick a route'],
      });
    const siblings = await L.findAll({ attributes: ['name'], where: { projectId: line.projectId }, transaction });
    const copyName = name ?? copyNameOf(line.name, new Set(siblings.map((s) => s.name)));
    const copy = await L.create(
      {
        projectId: line.projectId,
        routeId: line.routeId,
        name: copyName,
        notes: line.notes,
        fromChainageM: line.fromChainageM,
        toChainageM: line.toChainageM,
        ...columnsOf(designOf(line)),
        createdBy: userId,
        updatedBy: userId,
      },
      { transaction },
    );
    await linkLineIntoNetwork(sequelize, transaction, copy.id);
    await recordActivity(transaction, {
      projectId: line.projectId,
      actorUserId: userId,
      kind: 'line.created',
      subjectType: 'line',
      subjectId: copy.id,
      summary: `Copied line "${line.name}" as "${copy.name}"`,
    });
    return recordOf(copy, transaction);
  });
}

export async function updateLine(lineId: string, userId: string, input: UpdateLineInput): Promise<LineRecord> {
  const { Line: L, sequelize } = models();
  return sequelize.transaction(async (transaction) => {
    const line = await L.findByPk(lineId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!line) throw notFound();
    if (input.baseRevision !== undefined && input.baseRevision !== line.revision) {
      // Saved by the same person: another tab or window of theirs, not a colleague.
      const who = line.updatedBy === userId ? 'You saved' : 'Someone else saved';
      const where = line.updatedBy === userId ? ' in another tab or window' : '';
      throw new AppError(
        'conflict',
        `${who} revision ${line.revision} of this line${where} after this page opened revision ${input.baseRevision}; reload to carry on from it`,
      );
    }
    const fields: Partial<UpdateLineInput> = { ...input };
    const design = fields.design;
    delete fields.design;
    delete fields.baseRevision;
    if (fields.routeId !== undefined && fields.routeId !== line.routeId)
      await assertRouteInProject(fields.routeId, line.projectId);
    line.set(fields as Partial<Line>);
    const startBefore = JSON.stringify(line.startCondition);
    if (design) {
      await assertRamSiteInProject(design as LineDesign, line.projectId);
      line.set(columnsOf(design as LineDesign));
    }
    const geometryChanged =
      design !== undefined ||
      fields.routeId !== undefined ||
      fields.fromChainageM !== undefined ||
      fields.toChainageM !== undefined;
    if (geometryChanged) {
      if (!line.routeId)
        throw new AppError('bad_request', 'This line has lost its route; pick a route first', {
          routeId: ['Pick a route'],
        });
      const stations = await stationsOfLine(line.routeId, {
        fromChainageM: line.fromChainageM,
        toChainageM: line.toChainageM,
      });
      assertDesignFits(designOf(line), stations, await lineSiteContext(line.projectId));
    }
    line.revision += 1;
    line.updatedBy = userId;
    await line.save({ transaction });
    // A new start (another ram site, a water level instead of a ram) joins the network where it says.
    if (JSON.stringify(line.startCondition) !== startBefore)
      await rejoinLineStart(models().sequelize, transaction, line.id);
    await recordActivity(transaction, {
      projectId: line.projectId,
      actorUserId: userId,
      kind: 'line.edited',
      subjectType: 'line',
      subjectId: line.id,
      summary: `Edited line "${line.name}"`,
    });
    return recordOf(line, transaction);
  });
}

/**
 * Replaces a line's pipe stretches inside the caller's transaction (least-cost sizes applied from
 * the network): the line is locked, the new design checked against its stations like any edit,
 * its revision counted and the edit recorded. A design that no longer fits is a 400 naming the field.
 */
export async function setLineStretches(
  transaction: Transaction,
  lineId: string,
  userId: string,
  stretches: LineDesign['stretches'],
  summary: string,
): Promise<void> {
  const line = await models().Line.findByPk(lineId, { transaction, lock: transaction.LOCK.UPDATE });
  if (!line) throw notFound('A line of the network is gone; size the network again');
  if (!line.routeId)
    throw new AppError('bad_request', `The line "${line.name}" has lost its route; pick a route first`, {
      routeId: ['Pick a route'],
    });
  const design = { ...designOf(line), stretches };
  const stations = await stationsOfLine(line.routeId, {
    fromChainageM: line.fromChainageM,
    toChainageM: line.toChainageM,
  });
  assertDesignFits(design, stations, await lineSiteContext(line.projectId));
  line.set(columnsOf(design));
  line.revision += 1;
  line.updatedBy = userId;
  await line.save({ transaction });
  await recordActivity(transaction, {
    projectId: line.projectId,
    actorUserId: userId,
    kind: 'line.edited',
    subjectType: 'line',
    subjectId: line.id,
    summary,
  });
}

export async function deleteLine(lineId: string, userId: string): Promise<void> {
  await models().sequelize.transaction(async (transaction) => {
    const line = await models().Line.findByPk(lineId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!line) throw notFound();
    const { sequelize } = models();
    // The ends the line's link joined: when nothing else joins them once the line is gone, and they stand
    // for no tank, ram, source or demand, they were the line's own and go with it, so the network has no
    // part left with no head to fix it.
    const [ends] = await sequelize.query(
      'SELECT from_node_id AS id FROM network_links WHERE line_id = :lineId UNION SELECT to_node_id FROM network_links WHERE line_id = :lineId',
      { replacements: { lineId }, transaction },
    );
    await line.destroy({ transaction });
    const endIds = (ends as { id: string }[]).map((end) => end.id);
    if (endIds.length > 0) {
      await sequelize.query(
        `DELETE FROM network_nodes n WHERE n.id IN (:endIds) AND n.kind IN ('source', 'junction', 'outlet')
           AND n.water_source_id IS NULL AND n.ram_site_id IS NULL AND n.tank_id IS NULL
           AND NOT EXISTS (SELECT 1 FROM network_links l WHERE l.from_node_id = n.id OR l.to_node_id = n.id)
           AND NOT EXISTS (SELECT 1 FROM demand_uses d WHERE d.outlet_node_id = n.id)`,
        { replacements: { endIds }, transaction },
      );
    }
    await recordActivity(transaction, {
      projectId: line.projectId,
      actorUserId: userId,
      kind: 'line.deleted',
      subjectType: 'line',
      subjectId: line.id,
      summary: `Removed line "${line.name}"`,
      data: { name: line.name },
    });
  });
}
