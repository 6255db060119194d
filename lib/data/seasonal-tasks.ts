import 'server-only';
import { Op } from 'sequelize';
import { seasonalTasks } from '../../hydraulics/index';
import { models } from '../../models';
import { AppError, notFound } from '../errors';
import type { SeasonalTaskRecord } from '../lift/records';
import { drainPointsOf } from '../lines/winter';
import type {
  GenerateSeasonalTasksInput,
  SeasonalTaskInput,
  UpdateSeasonalTaskInput,
} from '../validations/seasonal-tasks';
import { seasonalTaskRecord } from './lift-records';
import { lineWintersForProject, type ProjectLineWinter } from './line-winter';
import { displayUnits, formatQuantity } from '../units';

const today = (): string => new Date().toISOString().slice(0, 10);

export async function listSeasonalTasks(projectId: string): Promise<SeasonalTaskRecord[]> {
  const rows = await models().SeasonalTask.findAll({
    where: { projectId },
    order: [
      ['dueOn', 'ASC'],
      ['title', 'ASC'],
    ],
  });
  return rows.map(seasonalTaskRecord);
}

export async function createSeasonalTask(projectId: string, input: SeasonalTaskInput): Promise<SeasonalTaskRecord> {
  const row = await models().SeasonalTask.create({ ...input, projectId, doneOn: input.done ? today() : null });
  return seasonalTaskRecord(row);
}

export async function updateSeasonalTask(
  projectId: string,
  taskId: string,
  input: UpdateSeasonalTaskInput,
): Promise<SeasonalTaskRecord> {
  const { SeasonalTask, sequelize } = models();
  return sequelize.transaction(async (transaction) => {
    const row = await SeasonalTask.findOne({
      where: { id: taskId, projectId },
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    if (!row) throw notFound('No such task in this project');
    const doneOn = input.done === undefined ? row.doneOn : input.done ? (row.doneOn ?? today()) : null;
    await row.update({ ...input, doneOn }, { transaction });
    return seasonalTaskRecord(row);
  });
}

export async function deleteSeasonalTask(projectId: string, taskId: string): Promise<void> {
  const removed = await models().SeasonalTask.destroy({ where: { id: taskId, projectId } });
  if (removed === 0) throw notFound('No such task in this project');
}

/**
 * Adds a year's upkeep tasks from the frost dates, all in one transaction. Refused (409) when the
 * year already has open tasks unless `replace` is set; tasks marked done are always kept.
 */
/** Where to open each drained line, by chainage in the project's units, for the drain-down and refill tasks. */
function drainWords(
  lines: readonly ProjectLineWinter[],
  drainedLabels: ReadonlySet<string>,
  unitSystem: 'metric' | 'us',
): string {
  const units = displayUnits(unitSystem);
  return lines
    .filter((line) => drainedLabels.has(line.name))
    .map((line) => {
      const drains = drainPointsOf(line.plan);
      return `${line.name}: ${drains.length ? drains.map((d) => `ch. ${formatQuantity('chainage', d.chainageM, units.system)} (${d.place})`).join(', ') : 'no low point stands out; drain at the lower end'}.`;
    })
    .join(' ');
}

export async function generateSeasonalTasks(
  projectId: string,
  input: GenerateSeasonalTasksInput,
): Promise<SeasonalTaskRecord[]> {
  const lines = await lineWintersForProject(projectId);
  const project = await models().Project.findByPk(projectId, { attributes: ['unitSystem'] });
  const plan = seasonalTasks({
    lines: lines.flatMap((line) => (line.winterLine ? [line.winterLine] : [])),
    year: input.year,
    hemisphere: input.hemisphere,
    firstFrost: input.firstFrost,
    drainDownLeadDays: input.drainDownLeadDays,
    ...(input.lastFrost ? { lastFrost: input.lastFrost } : {}),
  });
  const { SeasonalTask, sequelize } = models();
  return sequelize.transaction(async (transaction) => {
    const inYear = { projectId, done: false, dueOn: { [Op.between]: [`${input.year}-01-01`, `${input.year}-12-31`] } };
    const open = await SeasonalTask.count({ where: inYear, transaction });
    if (open > 0 && !input.replace) {
      throw new AppError(
        'conflict',
        `${input.year} already has ${open} open tasks; send replace: true to replace them`,
        {
          replace: ['The year already has open tasks'],
        },
      );
    }
    if (open > 0) await SeasonalTask.destroy({ where: inYear, transaction });
    const rows = await SeasonalTask.bulkCreate(
      plan.tasks.map((task) => {
        const drained = new Set((task.lines ?? []).map((line) => line.label));
        const where = drained.size
          ? ` Drain points: ${drainWords(lines, drained, project?.unitSystem ?? 'metric')}`
          : '';
        return {
          projectId,
          kind: task.kind,
          title: task.title,
          detail: `${task.detail}${where}`,
          dueOn: task.date,
          source: task.source,
        };
      }),
      { transaction },
    );
    return rows.map(seasonalTaskRecord);
  });
}
