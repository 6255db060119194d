import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { UnitSystem } from '../lib/units/quantities';

export type { UnitSystem };

export class Project extends Model<InferAttributes<Project>, InferCreationAttributes<Project>> {
  declare id: CreationOptional<string>;
  declare teamId: string;
  declare name: string;
  declare description: CreationOptional<string>;
  declare unitSystem: CreationOptional<UnitSystem>;
  declare siteNotes: CreationOptional<string>;
  /** Depth frost reaches at the site, m (local code or records); null when not known. */
  declare frostDepthM: CreationOptional<number | null>;
  /** How people on this project write decimals in number boxes; null = the browser's locale. */
  declare decimalMark: CreationOptional<'.' | ',' | null>;
  declare timeZone: CreationOptional<string | null>;
  declare archivedAt: CreationOptional<Date | null>;
  declare createdBy: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initialise(sequelize: Sequelize): void {
    Project.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        teamId: { type: DataTypes.UUID, allowNull: false },
        name: { type: DataTypes.STRING(120), allowNull: false },
        description: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        unitSystem: { type: DataTypes.STRING(8), allowNull: false, defaultValue: 'metric' },
        siteNotes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        frostDepthM: { type: DataTypes.DOUBLE, allowNull: true },
        decimalMark: { type: DataTypes.STRING(1), allowNull: true },
        timeZone: { type: DataTypes.STRING(64), allowNull: true },
        archivedAt: { type: DataTypes.DATE, allowNull: true },
        createdBy: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'projects', underscored: true },
    );
  }
}
