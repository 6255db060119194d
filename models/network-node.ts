import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

export type NetworkNodeKind = 'source' | 'ram-outlet' | 'tank' | 'break-pressure-tank' | 'junction' | 'outlet';
export type OutletKind = 'tap' | 'trough' | 'house' | 'garden' | 'tank-inlet' | 'free';

/**
 * Kind-specific figures of a node, SI. What a linked record holds (a tank's levels, a ram's plan,
 * a source's yield log) is read from that record, never copied here.
 */
export interface NetworkNodeData {
  /** Source or break-pressure tank: free water level, m above datum. */
  waterLevelM?: number | null;
  /** A source made from a line that started at typed pump heads. */
  typedPumpHead?: { outletHeadM: number; shutoffHeadM?: number };
  /** Tank: whether a float valve shuts the inlet when the tank is full. */
  inletFloatValve?: boolean;
  /** Outlet: what it is. */
  outletKind?: OutletKind;
  /** Outlet: residual pressure head wanted at the peak hour, m; null = the line's setting. */
  residualHeadM?: number | null;
  /**
   * Outlet: where its demand comes from: the uses tied to it, a fixed flow, or (a line end) whatever the line's own
   * flow is.
   */
  demandFrom?: 'uses' | 'fixed' | 'line';
  /** Outlet: the fixed peak demand, m³/s, when `demandFrom` is 'fixed'. */
  fixedDemandM3s?: number | null;
}

/** A point of the project's water system where links meet, or where water enters or leaves it. */
export class NetworkNode extends Model<InferAttributes<NetworkNode>, InferCreationAttributes<NetworkNode>> {
  declare id: CreationOptional<string>;
  declare projectId: string;
  declare kind: NetworkNodeKind;
  declare name: string;
  declare elevationM: CreationOptional<number | null>;
  declare waterSourceId: CreationOptional<string | null>;
  declare ramSiteId: CreationOptional<string | null>;
  declare tankId: CreationOptional<string | null>;
  declare lineId: CreationOptional<string | null>;
  declare chainageM: CreationOptional<number | null>;
  declare eastM: CreationOptional<number | null>;
  declare northM: CreationOptional<number | null>;
  declare data: CreationOptional<NetworkNodeData>;
  declare notes: CreationOptional<string>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initialise(sequelize: Sequelize): void {
    NetworkNode.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        projectId: { type: DataTypes.UUID, allowNull: false },
        kind: { type: DataTypes.STRING(24), allowNull: false },
        name: { type: DataTypes.STRING(120), allowNull: false },
        elevationM: { type: DataTypes.DOUBLE, allowNull: true },
        waterSourceId: { type: DataTypes.UUID, allowNull: true },
        ramSiteId: { type: DataTypes.UUID, allowNull: true },
        tankId: { type: DataTypes.UUID, allowNull: true },
        lineId: { type: DataTypes.UUID, allowNull: true },
        chainageM: { type: DataTypes.DOUBLE, allowNull: true },
        eastM: { type: DataTypes.DOUBLE, allowNull: true },
        northM: { type: DataTypes.DOUBLE, allowNull: true },
        data: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'network_nodes', underscored: true },
    );
  }
}
