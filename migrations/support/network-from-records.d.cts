import type { Sequelize, Transaction } from 'sequelize';

/** Every project's network (or the listed projects'), for projects that have none yet; returns how many were built. */
export function buildNetworksFromRecords(
  sequelize: Sequelize,
  transaction: Transaction,
  projectIds?: string[],
): Promise<number>;
/** One project's network from its records; false when it already has one. */
export function buildNetworkOfProject(
  sequelize: Sequelize,
  transaction: Transaction,
  projectId: string,
): Promise<boolean>;
/** Adds one saved line to its project's network (once); returns the link id, or null when the line is gone. */
export function linkLineIntoNetwork(
  sequelize: Sequelize,
  transaction: Transaction,
  lineId: string,
): Promise<string | null>;
/** Re-joins a line's link at the node its (changed) start names; returns the link id, or null when the line is gone. */
export function rejoinLineStart(sequelize: Sequelize, transaction: Transaction, lineId: string): Promise<string | null>;
