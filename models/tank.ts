import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

export type TankSupplyKind = 'ram-sites' | 'source' | 'entered';

/** An outlet fed from the tank, for the tank elevation it needs (SI). */
export interface TankOutletRow {
  label: string;
  elevationM: number;
  residualHeadM: number;
  frictionLossM: number;
}

/** A storage tank: its size and levels, where its water comes from, and what it must reach. */
export class Tank extends Model<InferAttributes<Tank>, InferCreationAttributes<Tank>> {
  declare id: CreationOptional<string>;
  declare projectId: string;
  declare name: string;
  declare volumeM3: number;
  declare baseElevationM: CreationOptional<number | null>;
  declare lowLevelM: CreationOptional<number>;
  declare overflowLevelM: CreationOptional<number | null>;
  declare supplyKind: CreationOptional<TankSupplyKind>;
  declare supplySourceId: CreationOptional<string | null>;
  declare supplyFlowM3s: CreationOptional<number | null>;
  declare supplyHoursPerDay: CreationOptional<number>;
  declare supplyStartHour: CreationOptional<number>;
  declare reserveDays: CreationOptional<number>;
  declare outlets: CreationOptional<TankOutletRow[]>;
  declare notes: CreationOptional<string>;
  declare createdBy: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initialise(sequelize: Sequelize): void {
    Tank.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        projectId: { type: DataTypes.UUID, allowNull: false },
        name: { type: DataTypes.STRING(120), allowNull: false },
        volumeM3: { type: DataTypes.DOUBLE, allowNull: false },
        baseElevationM: { type: DataTypes.DOUBLE, allowNull: true },
        lowLevelM: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
        overflowLevelM: { type: DataTypes.DOUBLE, allowNull: true },
        supplyKind: { type: DataTypes.STRING(16), allowNull: false, defaultValue: 'ram-sites' },
        supplySourceId: { type: DataTypes.UUID, allowNull: true },
        supplyFlowM3s: { type: DataTypes.DOUBLE, allowNull: true },
        supplyHoursPerDay: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 24 },
        supplyStartHour: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        reserveDays: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
        outlets: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        createdBy: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'tanks', underscored: true },
    );
  }
}
