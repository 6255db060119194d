import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** How the drive flow of a commissioning reading was found. */
export type DriveMeasure = 'drive' | 'waste' | 'plan';

/** Readings taken at a running ram on one day. */
export class RamCommissioningReading extends Model<
  InferAttributes<RamCommissioningReading>,
  InferCreationAttributes<RamCommissioningReading>
> {
  declare id: CreationOptional<string>;
  declare ramSiteId: string;
  declare measuredOn: string;
  declare beatsPerMinute: number;
  declare deliveredBucketVolumeM3: CreationOptional<number | null>;
  declare deliveredBucketSeconds: CreationOptional<number | null>;
  declare deliveredFlowM3s: CreationOptional<number | null>;
  declare driveMeasure: CreationOptional<DriveMeasure>;
  declare driveBucketVolumeM3: CreationOptional<number | null>;
  declare driveBucketSeconds: CreationOptional<number | null>;
  declare driveFlowM3s: CreationOptional<number | null>;
  declare pressureAtPumpPa: CreationOptional<number | null>;
  declare supplyHeadM: number;
  declare deliveryHeadM: CreationOptional<number | null>;
  declare notes: CreationOptional<string>;
  declare createdBy: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initialise(sequelize: Sequelize): void {
    RamCommissioningReading.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        ramSiteId: { type: DataTypes.UUID, allowNull: false },
        measuredOn: { type: DataTypes.DATEONLY, allowNull: false },
        beatsPerMinute: { type: DataTypes.DOUBLE, allowNull: false },
        deliveredBucketVolumeM3: { type: DataTypes.DOUBLE, allowNull: true },
        deliveredBucketSeconds: { type: DataTypes.DOUBLE, allowNull: true },
        deliveredFlowM3s: { type: DataTypes.DOUBLE, allowNull: true },
        driveMeasure: { type: DataTypes.STRING(8), allowNull: false, defaultValue: 'plan' },
        driveBucketVolumeM3: { type: DataTypes.DOUBLE, allowNull: true },
        driveBucketSeconds: { type: DataTypes.DOUBLE, allowNull: true },
        driveFlowM3s: { type: DataTypes.DOUBLE, allowNull: true },
        pressureAtPumpPa: { type: DataTypes.DOUBLE, allowNull: true },
        supplyHeadM: { type: DataTypes.DOUBLE, allowNull: false },
        deliveryHeadM: { type: DataTypes.DOUBLE, allowNull: true },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        createdBy: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'ram_commissioning_readings', underscored: true },
    );
  }
}
