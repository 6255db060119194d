import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { RevisionStatus } from '../lib/review/statuses';

/** A numbered, immutable snapshot of a project's whole design, moving through the review cycle. */
export class Revision extends Model<InferAttributes<Revision>, InferCreationAttributes<Revision>> {
  declare id: CreationOptional<string>;
  declare projectId: string;
  declare number: number;
  declare status: CreationOptional<RevisionStatus>;
  declare note: CreationOptional<string>;
  declare snapshot: unknown;
  declare createdBy: string | null;
  declare submittedBy: CreationOptional<string | null>;
  declare submittedAt: CreationOptional<Date | null>;
  declare reviewedBy: CreationOptional<string | null>;
  declare reviewedAt: CreationOptional<Date | null>;
  declare issuedBy: CreationOptional<string | null>;
  declare issuedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initialise(sequelize: Sequelize): void {
    Revision.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        projectId: { type: DataTypes.UUID, allowNull: false },
        number: { type: DataTypes.INTEGER, allowNull: false },
        status: { type: DataTypes.STRING(24), allowNull: false, defaultValue: 'draft' },
        note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        snapshot: { type: DataTypes.JSONB, allowNull: false },
        createdBy: { type: DataTypes.UUID, allowNull: true },
        submittedBy: { type: DataTypes.UUID, allowNull: true },
        submittedAt: { type: DataTypes.DATE, allowNull: true },
        reviewedBy: { type: DataTypes.UUID, allowNull: true },
        reviewedAt: { type: DataTypes.DATE, allowNull: true },
        issuedBy: { type: DataTypes.UUID, allowNull: true },
        issuedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'revisions', underscored: true },
    );
  }
}
