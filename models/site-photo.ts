import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** How a photo got its place on a route: from its own position, picked by a person, or not yet. */
export type PhotoPlacement = 'position' | 'picked' | 'unplaced';

/** A site photo: the cleaned image and thumbnail live in object storage; this row says where and when. */
export class SitePhoto extends Model<InferAttributes<SitePhoto>, InferCreationAttributes<SitePhoto>> {
  declare id: CreationOptional<string>;
  declare projectId: string;
  declare fileName: string;
  declare contentType: string;
  declare sizeBytes: number;
  declare width: number;
  declare height: number;
  declare imageKey: string;
  declare thumbnailKey: string;
  declare takenAt: Date | null;
  declare latitude: number | null;
  declare longitude: number | null;
  declare routeId: string | null;
  declare chainageM: number | null;
  declare offsetM: number | null;
  declare placement: PhotoPlacement;
  declare caption: CreationOptional<string>;
  declare inReport: CreationOptional<boolean>;
  declare uploadedBy: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initialise(sequelize: Sequelize): void {
    SitePhoto.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        projectId: { type: DataTypes.UUID, allowNull: false },
        fileName: { type: DataTypes.STRING(255), allowNull: false },
        contentType: { type: DataTypes.STRING(40), allowNull: false },
        sizeBytes: { type: DataTypes.INTEGER, allowNull: false },
        width: { type: DataTypes.INTEGER, allowNull: false },
        height: { type: DataTypes.INTEGER, allowNull: false },
        imageKey: { type: DataTypes.STRING(300), allowNull: false },
        thumbnailKey: { type: DataTypes.STRING(300), allowNull: false },
        takenAt: { type: DataTypes.DATE, allowNull: true },
        latitude: { type: DataTypes.DOUBLE, allowNull: true },
        longitude: { type: DataTypes.DOUBLE, allowNull: true },
        routeId: { type: DataTypes.UUID, allowNull: true },
        chainageM: { type: DataTypes.DOUBLE, allowNull: true },
        offsetM: { type: DataTypes.DOUBLE, allowNull: true },
        placement: { type: DataTypes.STRING(16), allowNull: false },
        caption: { type: DataTypes.STRING(500), allowNull: false, defaultValue: '' },
        inReport: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        uploadedBy: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'site_photos', underscored: true },
    );
  }
}
