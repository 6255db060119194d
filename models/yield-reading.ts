import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

export type ReadingSeason = 'dry' | 'wet' | 'unspecified';

/** One dated flow measurement of a source: a timed bucket or a direct figure. */
export class YieldReadingRow extends Model<InferAttributes<YieldReadingRow>, InferCreationAttributes<YieldReadingRow>> {
  declare id: CreationOptional<string>;
  declare sourceId: string;
  /** `YYYY-MM-DD`. */
  declare measuredOn: string;
  declare season: CreationOptional<ReadingSeason>;
  declare bucketVolumeM3: CreationOptional<number | null>;
  declare bucketSeconds: CreationOptional<number | null>;
  declare flowM3s: CreationOptional<number | null>;
  declare note: CreationOptional<string>;
  declare createdBy: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initialise(sequelize: Sequelize): void {
    YieldReadingRow.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        sourceId: { type: DataTypes.UUID, allowNull: false },
        measuredOn: { type: DataTypes.DATEONLY, allowNull: false },
        season: { type: DataTypes.STRING(16), allowNull: false, defaultValue: 'unspecified' },
        bucketVolumeM3: { type: DataTypes.DOUBLE, allowNull: true },
        bucketSeconds: { type: DataTypes.DOUBLE, allowNull: true },
        flowM3s: { type: DataTypes.DOUBLE, allowNull: true },
        note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        createdBy: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'yield_readings', underscored: true, modelName: 'YieldReading' },
    );
  }
}
