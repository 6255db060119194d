import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { PipeSpec } from '../hydraulics/index';

export type NetworkLinkKind = 'line' | 'pipe' | 'valve';
export type ValveKind = 'isolation' | 'check' | 'pressure-reducing' | 'float';

/** Kind-specific figures of a link, SI. A line link reads its pipes and profile from the line. */
export interface NetworkLinkData {
  /** Typed pipe: length, m. */
  lengthM?: number;
  /** Typed pipe: a catalogue pipe id or the pipe itself. */
  pipe?: string | PipeSpec | null;
  /** Typed pipe from a ram plan without a catalogue pipe: inside diameter, m, and Hazen-Williams C. */
  insideDiameterM?: number | null;
  hazenC?: number | null;
  /** Sum of minor loss coefficients. */
  minorK?: number;
  /** Valve: what it is. */
  valveKind?: ValveKind;
  /** Isolation valve: open or shut. */
  open?: boolean;
  /** Pressure-reducing valve: pressure head it holds downstream, m. */
  setHeadM?: number;
}

/** A link of the project's water system: a line (split at its take-offs), a typed pipe, or a valve. */
export class NetworkLink extends Model<InferAttributes<NetworkLink>, InferCreationAttributes<NetworkLink>> {
  declare id: CreationOptional<string>;
  declare projectId: string;
  declare kind: NetworkLinkKind;
  declare name: string;
  declare fromNodeId: string;
  declare toNodeId: string;
  declare lineId: CreationOptional<string | null>;
  declare data: CreationOptional<NetworkLinkData>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initialise(sequelize: Sequelize): void {
    NetworkLink.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        projectId: { type: DataTypes.UUID, allowNull: false },
        kind: { type: DataTypes.STRING(16), allowNull: false },
        name: { type: DataTypes.STRING(120), allowNull: false },
        fromNodeId: { type: DataTypes.UUID, allowNull: false },
        toNodeId: { type: DataTypes.UUID, allowNull: false },
        lineId: { type: DataTypes.UUID, allowNull: true },
        data: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'network_links', underscored: true },
    );
  }
}
