import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { CommentAnchor } from '../lib/review/anchors';

/** A review comment on a revision (or on the working copy when `revisionId` is null); replies name their parent. */
export class Comment extends Model<InferAttributes<Comment>, InferCreationAttributes<Comment>> {
  declare id: CreationOptional<string>;
  declare projectId: string;
  declare revisionId: string | null;
  declare parentId: string | null;
  declare authorId: string | null;
  declare body: string;
  declare anchor: CommentAnchor;
  declare mentions: CreationOptional<string[]>;
  declare resolvedBy: CreationOptional<string | null>;
  declare resolvedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initialise(sequelize: Sequelize): void {
    Comment.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        projectId: { type: DataTypes.UUID, allowNull: false },
        revisionId: { type: DataTypes.UUID, allowNull: true },
        parentId: { type: DataTypes.UUID, allowNull: true },
        authorId: { type: DataTypes.UUID, allowNull: true },
        body: { type: DataTypes.TEXT, allowNull: false },
        anchor: { type: DataTypes.JSONB, allowNull: false },
        mentions: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
        resolvedBy: { type: DataTypes.UUID, allowNull: true },
        resolvedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'comments', underscored: true },
    );
  }
}
