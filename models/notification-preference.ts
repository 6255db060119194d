import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** One person's choice for one kind of notification; no row means the kind's default (on). */
export class NotificationPreference extends Model<
  InferAttributes<NotificationPreference>,
  InferCreationAttributes<NotificationPreference>
> {
  declare userId: string;
  declare kind: string;
  declare enabled: boolean;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initialise(sequelize: Sequelize): void {
    NotificationPreference.init(
      {
        userId: { type: DataTypes.UUID, allowNull: false, primaryKey: true },
        kind: { type: DataTypes.STRING(40), allowNull: false, primaryKey: true },
        enabled: { type: DataTypes.BOOLEAN, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'notification_preferences', underscored: true },
    );
  }
}
