import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type {
  LineDevice,
  LineEnd,
  LineFitting,
  LineFlow,
  LineSettings,
  LineStart,
  LineStretch,
  PipeSpec,
} from '../hydraulics/index';

/** Where a line is fed: the core's own starts, or a ram site of the project whose plan gives the pump outlet head. */
export type StoredLineStart = LineStart | { kind: 'ram-site'; ramSiteId: string };
/** The core's flows, or what the feeding ram delivers. */
export type StoredLineFlow = LineFlow | { kind: 'pump-delivery' };

/** How a line is kept through winter, as the designer chose it. */
export interface LineWinterSetting {
  treatment: 'buried-below-frost' | 'drained-for-winter';
}

/** A pipeline laid along a survey route (or a chainage window of it). Its analysis is never stored. */
export class Line extends Model<InferAttributes<Line>, InferCreationAttributes<Line>> {
  declare id: CreationOptional<string>;
  declare projectId: string;
  declare routeId: string | null;
  declare name: string;
  declare notes: CreationOptional<string>;
  declare fromChainageM: number | null;
  declare toChainageM: number | null;
  declare startCondition: StoredLineStart;
  declare endCondition: LineEnd;
  declare flow: StoredLineFlow;
  declare stretches: LineStretch[];
  declare fittings: LineFitting[];
  declare devices: LineDevice[];
  declare pipes: PipeSpec[];
  declare settings: LineSettings;
  declare winter: CreationOptional<LineWinterSetting | null>;
  /** Counts saves of the working copy (a stale editor gets 409); not a review revision. */
  declare revision: CreationOptional<number>;
  declare createdBy: string | null;
  declare updatedBy: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initialise(sequelize: Sequelize): void {
    Line.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        projectId: { type: DataTypes.UUID, allowNull: false },
        routeId: { type: DataTypes.UUID, allowNull: true },
        name: { type: DataTypes.STRING(120), allowNull: false },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        fromChainageM: { type: DataTypes.DOUBLE, allowNull: true },
        toChainageM: { type: DataTypes.DOUBLE, allowNull: true },
        startCondition: { type: DataTypes.JSONB, allowNull: false },
        endCondition: { type: DataTypes.JSONB, allowNull: false },
        flow: { type: DataTypes.JSONB, allowNull: false },
        stretches: { type: DataTypes.JSONB, allowNull: false },
        fittings: { type: DataTypes.JSONB, allowNull: false },
        devices: { type: DataTypes.JSONB, allowNull: false },
        pipes: { type: DataTypes.JSONB, allowNull: false },
        settings: { type: DataTypes.JSONB, allowNull: false },
        winter: { type: DataTypes.JSONB, allowNull: true },
        revision: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        createdBy: { type: DataTypes.UUID, allowNull: true },
        updatedBy: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'lines', underscored: true },
    );
  }
}
