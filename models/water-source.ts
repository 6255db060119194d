import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

export type WaterSourceKind = 'creek' | 'spring' | 'other';
export type DesignYieldChoiceKind = 'lowest-recent-dry' | 'reading' | 'entered';

/** A creek or spring a project draws on; its design yield is computed from its readings. */
export class WaterSource extends Model<InferAttributes<WaterSource>, InferCreationAttributes<WaterSource>> {
  declare id: CreationOptional<string>;
  declare projectId: string;
  declare name: string;
  declare kind: CreationOptional<WaterSourceKind>;
  declare notes: CreationOptional<string>;
  declare designYieldChoice: CreationOptional<DesignYieldChoiceKind>;
  declare designReadingId: CreationOptional<string | null>;
  declare enteredYieldM3s: CreationOptional<number | null>;
  declare otherDrawM3s: CreationOptional<number>;
  declare createdBy: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initialise(sequelize: Sequelize): void {
    WaterSource.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        projectId: { type: DataTypes.UUID, allowNull: false },
        name: { type: DataTypes.STRING(120), allowNull: false },
        kind: { type: DataTypes.STRING(16), allowNull: false, defaultValue: 'creek' },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        designYieldChoice: { type: DataTypes.STRING(24), allowNull: false, defaultValue: 'lowest-recent-dry' },
        designReadingId: { type: DataTypes.UUID, allowNull: true },
        enteredYieldM3s: { type: DataTypes.DOUBLE, allowNull: true },
        otherDrawM3s: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
        createdBy: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'water_sources', underscored: true },
    );
  }
}
