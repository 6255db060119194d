import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { RamDriveMaterial, RamEfficiencyTableId } from '../hydraulics/index';

/** A hydraulic ram site: fall, drive pipe, lift and delivery pipe, all in SI. */
export class RamSite extends Model<InferAttributes<RamSite>, InferCreationAttributes<RamSite>> {
  declare id: CreationOptional<string>;
  declare projectId: string;
  declare name: string;
  declare sourceId: CreationOptional<string | null>;
  declare tankId: CreationOptional<string | null>;
  declare driveFlowM3s: number;
  declare fallM: number;
  declare driveLengthM: number;
  declare driveInsideDiameterM: number;
  declare driveMaterial: RamDriveMaterial;
  declare driveRigid: CreationOptional<boolean | null>;
  declare liftM: number;
  /** Elevation of the pump, m above the survey datum (where a delivery line's head is measured from). */
  declare pumpElevationM: CreationOptional<number | null>;
  declare deliveryLengthM: number;
  declare deliveryRouteId: CreationOptional<string | null>;
  declare deliveryPipeId: CreationOptional<string | null>;
  declare deliveryInsideDiameterM: CreationOptional<number | null>;
  declare deliveryHazenC: CreationOptional<number | null>;
  declare deliveryRatingPa: CreationOptional<number | null>;
  declare sizeClassId: CreationOptional<string | null>;
  declare pumpCount: CreationOptional<number>;
  declare measuredEfficiency: CreationOptional<number | null>;
  declare efficiencyTableId: CreationOptional<RamEfficiencyTableId>;
  declare notes: CreationOptional<string>;
  declare createdBy: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initialise(sequelize: Sequelize): void {
    RamSite.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        projectId: { type: DataTypes.UUID, allowNull: false },
        name: { type: DataTypes.STRING(120), allowNull: false },
        sourceId: { type: DataTypes.UUID, allowNull: true },
        tankId: { type: DataTypes.UUID, allowNull: true },
        driveFlowM3s: { type: DataTypes.DOUBLE, allowNull: false },
        fallM: { type: DataTypes.DOUBLE, allowNull: false },
        driveLengthM: { type: DataTypes.DOUBLE, allowNull: false },
        driveInsideDiameterM: { type: DataTypes.DOUBLE, allowNull: false },
        driveMaterial: { type: DataTypes.STRING(8), allowNull: false },
        driveRigid: { type: DataTypes.BOOLEAN, allowNull: true },
        liftM: { type: DataTypes.DOUBLE, allowNull: false },
        pumpElevationM: { type: DataTypes.DOUBLE, allowNull: true },
        deliveryLengthM: { type: DataTypes.DOUBLE, allowNull: false },
        deliveryRouteId: { type: DataTypes.UUID, allowNull: true },
        deliveryPipeId: { type: DataTypes.STRING(80), allowNull: true },
        deliveryInsideDiameterM: { type: DataTypes.DOUBLE, allowNull: true },
        deliveryHazenC: { type: DataTypes.DOUBLE, allowNull: true },
        deliveryRatingPa: { type: DataTypes.DOUBLE, allowNull: true },
        sizeClassId: { type: DataTypes.STRING(32), allowNull: true },
        pumpCount: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        measuredEfficiency: { type: DataTypes.DOUBLE, allowNull: true },
        efficiencyTableId: { type: DataTypes.STRING(32), allowNull: false, defaultValue: 'trade-pocketbook' },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        createdBy: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'ram_sites', underscored: true },
    );
  }
}
