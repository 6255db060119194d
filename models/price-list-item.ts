import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** What a team pays per metre for one catalogue pipe; least-cost sizing reads it. */
export class PriceListItem extends Model<InferAttributes<PriceListItem>, InferCreationAttributes<PriceListItem>> {
  declare id: CreationOptional<string>;
  declare teamId: string;
  declare pipeId: string;
  declare costPerM: number;
  declare notes: CreationOptional<string>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initialise(sequelize: Sequelize): void {
    PriceListItem.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        teamId: { type: DataTypes.UUID, allowNull: false },
        pipeId: { type: DataTypes.STRING(80), allowNull: false },
        costPerM: { type: DataTypes.DOUBLE, allowNull: false },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'price_list_items', underscored: true },
    );
  }
}
