import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

export type NetworkJobKind = 'solve' | 'day' | 'size';
export type NetworkJobStatus = 'queued' | 'running' | 'done' | 'failed';

/** One solve, day run or sizing of a project's network, run off the request thread; polled for progress. */
export class NetworkJob extends Model<InferAttributes<NetworkJob>, InferCreationAttributes<NetworkJob>> {
  declare id: CreationOptional<string>;
  declare projectId: string;
  declare kind: NetworkJobKind;
  declare status: CreationOptional<NetworkJobStatus>;
  declare progress: CreationOptional<number>;
  declare stage: CreationOptional<string>;
  declare options: CreationOptional<Record<string, unknown>>;
  declare result: CreationOptional<object | null>;
  declare error: CreationOptional<{ message: string; element?: string } | null>;
  declare createdBy: CreationOptional<string | null>;
  declare startedAt: CreationOptional<Date | null>;
  declare finishedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initialise(sequelize: Sequelize): void {
    NetworkJob.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        projectId: { type: DataTypes.UUID, allowNull: false },
        kind: { type: DataTypes.STRING(16), allowNull: false },
        status: { type: DataTypes.STRING(16), allowNull: false, defaultValue: 'queued' },
        progress: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
        stage: { type: DataTypes.STRING(200), allowNull: false, defaultValue: '' },
        options: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
        result: { type: DataTypes.JSONB, allowNull: true },
        error: { type: DataTypes.JSONB, allowNull: true },
        createdBy: { type: DataTypes.UUID, allowNull: true },
        startedAt: { type: DataTypes.DATE, allowNull: true },
        finishedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'network_jobs', underscored: true },
    );
  }
}
