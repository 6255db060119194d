import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

export type DemandUseKind = 'people' | 'livestock' | 'garden' | 'fixed';
export type DemandDeliveryKind = 'pattern' | 'peak-factor' | 'delivery-hours';

/** One daily water use of a project, with a published figure or the user's own. */
export class DemandUse extends Model<InferAttributes<DemandUse>, InferCreationAttributes<DemandUse>> {
  declare id: CreationOptional<string>;
  declare projectId: string;
  declare position: CreationOptional<number>;
  declare label: CreationOptional<string>;
  declare kind: DemandUseKind;
  declare count: CreationOptional<number | null>;
  declare areaM2: CreationOptional<number | null>;
  declare figureId: CreationOptional<string | null>;
  /** m³/person/day, m³/head/day, m of depth/day, or m³/day for a fixed use. */
  declare ownFigure: CreationOptional<number | null>;
  declare season: CreationOptional<'winter' | 'summer' | null>;
  declare deliveryKind: CreationOptional<DemandDeliveryKind>;
  declare patternPresetId: CreationOptional<string | null>;
  declare hourlyFractions: CreationOptional<number[] | null>;
  declare peakFactor: CreationOptional<number | null>;
  declare deliveryHours: CreationOptional<number | null>;
  declare startHour: CreationOptional<number | null>;
  /** The network outlet this use is drawn at; null = not tied yet. */
  declare outletNodeId: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initialise(sequelize: Sequelize): void {
    DemandUse.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        projectId: { type: DataTypes.UUID, allowNull: false },
        position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        label: { type: DataTypes.STRING(120), allowNull: false, defaultValue: '' },
        kind: { type: DataTypes.STRING(16), allowNull: false },
        count: { type: DataTypes.INTEGER, allowNull: true },
        areaM2: { type: DataTypes.DOUBLE, allowNull: true },
        figureId: { type: DataTypes.STRING(64), allowNull: true },
        ownFigure: { type: DataTypes.DOUBLE, allowNull: true },
        season: { type: DataTypes.STRING(8), allowNull: true },
        deliveryKind: { type: DataTypes.STRING(16), allowNull: false, defaultValue: 'peak-factor' },
        patternPresetId: { type: DataTypes.STRING(64), allowNull: true },
        hourlyFractions: { type: DataTypes.JSONB, allowNull: true },
        peakFactor: { type: DataTypes.DOUBLE, allowNull: true },
        deliveryHours: { type: DataTypes.DOUBLE, allowNull: true },
        startHour: { type: DataTypes.INTEGER, allowNull: true },
        outletNodeId: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'demand_uses', underscored: true, modelName: 'DemandUse' },
    );
  }
}
