import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

export type SeasonalTaskKindRow =
  'drain-down' | 'refill' | 'silt-cleaning' | 'intake-screen' | 'valve-exercise' | 'other';

/** A dated upkeep task of a project (drain-down, silt cleaning, intake screen, valves). */
export class SeasonalTaskRow extends Model<InferAttributes<SeasonalTaskRow>, InferCreationAttributes<SeasonalTaskRow>> {
  declare id: CreationOptional<string>;
  declare projectId: string;
  declare kind: CreationOptional<SeasonalTaskKindRow>;
  declare title: string;
  declare detail: CreationOptional<string>;
  declare dueOn: string;
  declare done: CreationOptional<boolean>;
  declare doneOn: CreationOptional<string | null>;
  declare source: CreationOptional<string>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initialise(sequelize: Sequelize): void {
    SeasonalTaskRow.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        projectId: { type: DataTypes.UUID, allowNull: false },
        kind: { type: DataTypes.STRING(20), allowNull: false, defaultValue: 'other' },
        title: { type: DataTypes.STRING(160), allowNull: false },
        detail: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        dueOn: { type: DataTypes.DATEONLY, allowNull: false },
        done: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        doneOn: { type: DataTypes.DATEONLY, allowNull: true },
        source: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'seasonal_tasks', underscored: true, modelName: 'SeasonalTask' },
    );
  }
}
