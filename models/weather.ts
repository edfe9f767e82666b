import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from "sequelize";
import { sequelize } from "@/models/db";

/** One hour of a park's weather, named by its end: rain that fell in the hour to `at`, air temperature at `at`. */
export class WeatherHour extends Model<InferAttributes<WeatherHour>, InferCreationAttributes<WeatherHour>> {
  declare parkId: string;
  declare at: Date;
  declare temperatureC: number | null;
  declare precipitationMm: number | null;
}

WeatherHour.init(
  {
    parkId: { type: DataTypes.UUID, allowNull: false, primaryKey: true },
    at: { type: DataTypes.DATE, allowNull: false, primaryKey: true },
    temperatureC: { type: DataTypes.REAL, allowNull: true },
    precipitationMm: { type: DataTypes.REAL, allowNull: true },
  },
  { sequelize, tableName: "weather_hours", underscored: true, timestamps: false },
);

/** A park's last weather fetch: the good values (null until one succeeded) and the last attempt. */
export class ParkWeather extends Model<InferAttributes<ParkWeather>, InferCreationAttributes<ParkWeather>> {
  declare parkId: string;
  declare measuredAt: CreationOptional<Date | null>;
  declare temperatureNowC: CreationOptional<number | null>;
  declare sunrise: CreationOptional<Date | null>;
  declare fetchedAt: CreationOptional<Date | null>;
  declare lastAttemptAt: Date;
  declare lastError: CreationOptional<string | null>;
}

ParkWeather.init(
  {
    parkId: { type: DataTypes.UUID, allowNull: false, primaryKey: true },
    measuredAt: { type: DataTypes.DATE, allowNull: true },
    temperatureNowC: { type: DataTypes.REAL, allowNull: true },
    sunrise: { type: DataTypes.DATE, allowNull: true },
    fetchedAt: { type: DataTypes.DATE, allowNull: true },
    lastAttemptAt: { type: DataTypes.DATE, allowNull: false },
    lastError: { type: DataTypes.STRING(300), allowNull: true },
  },
  { sequelize, tableName: "park_weather", underscored: true, timestamps: false },
);
