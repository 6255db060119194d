import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

export type AccountTokenPurpose = 'sign-up' | 'password-reset';

/**
 * A single-use, expiring link sent by mail; only the SHA-256 of the token is kept. A sign-up
 * holds the name and password hash until the address is confirmed (no user row before that).
 */
export class AccountToken extends Model<InferAttributes<AccountToken>, InferCreationAttributes<AccountToken>> {
  declare id: CreationOptional<string>;
  declare purpose: AccountTokenPurpose;
  declare email: string;
  declare userId: string | null;
  declare name: string | null;
  declare passwordHash: string | null;
  declare tokenHash: string;
  declare expiresAt: Date;
  declare usedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;

  static initialise(sequelize: Sequelize): void {
    AccountToken.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        purpose: { type: DataTypes.STRING(24), allowNull: false },
        email: { type: DataTypes.STRING(254), allowNull: false },
        userId: { type: DataTypes.UUID, allowNull: true },
        name: { type: DataTypes.STRING(120), allowNull: true },
        passwordHash: { type: DataTypes.STRING(255), allowNull: true },
        tokenHash: { type: DataTypes.STRING(64), allowNull: false },
        expiresAt: { type: DataTypes.DATE, allowNull: false },
        usedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'account_tokens', underscored: true, updatedAt: false },
    );
  }
}
