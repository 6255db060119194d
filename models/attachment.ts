import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

export type AttachmentKind = 'survey-file' | 'photo';

/** A file kept in object storage (the bytes live there; this row says what and where). */
export class Attachment extends Model<InferAttributes<Attachment>, InferCreationAttributes<Attachment>> {
  declare id: CreationOptional<string>;
  declare projectId: string;
  declare kind: AttachmentKind;
  declare fileName: string;
  declare contentType: string;
  declare sizeBytes: number;
  declare sha256: string;
  declare storageKey: string;
  declare uploadedBy: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initialise(sequelize: Sequelize): void {
    Attachment.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        projectId: { type: DataTypes.UUID, allowNull: false },
        kind: { type: DataTypes.STRING(16), allowNull: false },
        fileName: { type: DataTypes.STRING(255), allowNull: false },
        contentType: { type: DataTypes.STRING(120), allowNull: false },
        // BIGINT comes back from pg as a string; sizes stay far below 2^53.
        sizeBytes: {
          type: DataTypes.BIGINT,
          allowNull: false,
          get() {
            return Number(this.getDataValue('sizeBytes'));
          },
        },
        sha256: { type: DataTypes.STRING(64), allowNull: false },
        storageKey: { type: DataTypes.STRING(300), allowNull: false },
        uploadedBy: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'attachments', underscored: true },
    );
  }
}
