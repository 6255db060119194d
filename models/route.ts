import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** A surveyed route: the ordered ground stations a line is laid along. */
export class Route extends Model<InferAttributes<Route>, InferCreationAttributes<Route>> {
  declare id: CreationOptional<string>;
  declare projectId: string;
  declare name: string;
  declare notes: CreationOptional<string>;
  declare sourceAttachmentId: CreationOptional<string | null>;
  declare pointCount: CreationOptional<number>;
  declare lengthM: CreationOptional<number>;
  declare createdBy: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initialise(sequelize: Sequelize): void {
    Route.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        projectId: { type: DataTypes.UUID, allowNull: false },
        name: { type: DataTypes.STRING(120), allowNull: false },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        sourceAttachmentId: { type: DataTypes.UUID, allowNull: true },
        pointCount: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        lengthM: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
        createdBy: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'routes', underscored: true },
    );
  }
}
