import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { HeightSource } from '../hydraulics/index';

/** One station of a route. `rawElevationM` is the surveyed value and is never overwritten. */
export class RoutePoint extends Model<InferAttributes<RoutePoint>, InferCreationAttributes<RoutePoint>> {
  declare routeId: string;
  declare seq: number;
  declare latitude: number | null;
  declare longitude: number | null;
  declare chainageM: number;
  declare slopeChainageM: number | null;
  declare elevationM: number;
  declare rawElevationM: number;
  declare label: string | null;
  declare heightSource: HeightSource;
  declare confidenceM: number | null;
  declare recordedAt: Date | null;
  /** Taken out of the cleaned profile by an accepted clean-up; kept so the raw survey stays whole. */
  declare excluded: CreationOptional<boolean>;
  /** Clean-up checks the user rejected for this point, so they are not proposed again. */
  declare dismissedChecks: CreationOptional<string[]>;

  static initialise(sequelize: Sequelize): void {
    RoutePoint.init(
      {
        routeId: { type: DataTypes.UUID, allowNull: false, primaryKey: true },
        seq: { type: DataTypes.INTEGER, allowNull: false, primaryKey: true },
        latitude: { type: DataTypes.DOUBLE, allowNull: true },
        longitude: { type: DataTypes.DOUBLE, allowNull: true },
        chainageM: { type: DataTypes.DOUBLE, allowNull: false },
        slopeChainageM: { type: DataTypes.DOUBLE, allowNull: true },
        elevationM: { type: DataTypes.DOUBLE, allowNull: false },
        rawElevationM: { type: DataTypes.DOUBLE, allowNull: false },
        label: { type: DataTypes.STRING(200), allowNull: true },
        heightSource: { type: DataTypes.STRING(16), allowNull: false },
        confidenceM: { type: DataTypes.DOUBLE, allowNull: true },
        recordedAt: { type: DataTypes.DATE, allowNull: true },
        excluded: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        dismissedChecks: { type: DataTypes.ARRAY(DataTypes.STRING(24)), allowNull: false, defaultValue: [] },
      },
      { sequelize, tableName: 'route_points', underscored: true, timestamps: false },
    );
  }
}
