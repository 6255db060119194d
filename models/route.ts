import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { SurveyFeature, SurveyFormat, SurveyImportWarning } from '../lib/survey/parsed-survey';

/** Where a route's points came from: an imported file's format, or an edit in Runnel. */
export type RouteSourceFormat = SurveyFormat | 'sketch' | 'joined' | 'split' | 'typed';

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
  declare sourceFormat: CreationOptional<RouteSourceFormat | null>;
  /** 3-D length of the cleaned profile (what pipe laid on the ground needs), metres. */
  declare slopeLengthM: CreationOptional<number>;
  /** Named places along the route (GPX waypoints snapped to the nearest chainage). */
  declare features: CreationOptional<SurveyFeature[]>;
  /** What the import noticed (joined segments, closure, duplicates), shown on the route page. */
  declare importNotes: CreationOptional<SurveyImportWarning[]>;
  /** Level-book runs that closed on a known mark: computed minus known, metres. */
  declare closureErrorM: CreationOptional<number | null>;
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
        sourceFormat: { type: DataTypes.STRING(24), allowNull: true },
        slopeLengthM: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
        features: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
        importNotes: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
        closureErrorM: { type: DataTypes.DOUBLE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'routes', underscored: true },
    );
  }
}
