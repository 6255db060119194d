import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** One thing someone did on a project; written only by lib/activity/record.ts. */
export class Activity extends Model<InferAttributes<Activity>, InferCreationAttributes<Activity>> {
  declare id: CreationOptional<string>;
  declare projectId: string;
  declare actorUserId: string | null;
  declare kind: string;
  declare subjectType: string | null;
  declare subjectId: string | null;
  declare summary: string;
  declare data: CreationOptional<Record<string, unknown>>;
  declare createdAt: CreationOptional<Date>;

  static initialise(sequelize: Sequelize): void {
    Activity.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        projectId: { type: DataTypes.UUID, allowNull: false },
        actorUserId: { type: DataTypes.UUID, allowNull: true },
        kind: { type: DataTypes.STRING(48), allowNull: false },
        subjectType: { type: DataTypes.STRING(24), allowNull: true },
        subjectId: { type: DataTypes.UUID, allowNull: true },
        summary: { type: DataTypes.TEXT, allowNull: false },
        data: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'activities', underscored: true, updatedAt: false },
    );
  }
}
