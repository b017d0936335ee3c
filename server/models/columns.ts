import { DataTypes, type ModelAttributeColumnOptions, type Model } from 'sequelize';

/**
 * A bigint column of money in integer minor units, read back as a JavaScript number (pg hands
 * int8 back as a string; minor amounts stay far below 2^53).
 */
export function minorUnitsColumn(
  name: string,
  allowNull = true,
): ModelAttributeColumnOptions<Model> {
  return {
    type: DataTypes.BIGINT,
    allowNull,
    get(this: Model) {
      const raw = this.getDataValue(name) as string | number | null;
      return raw === null || raw === undefined ? raw : Number(raw);
    },
  };
}

/**
 * A PostgreSQL numeric column read back as a JavaScript number (Sequelize hands DECIMAL back as a
 * string to keep precision; our meter values and prices fit a double).
 */
export function numericColumn(
  name: string,
  precision: number,
  scale: number,
  allowNull = true,
): ModelAttributeColumnOptions<Model> {
  return {
    type: DataTypes.DECIMAL(precision, scale),
    allowNull,
    get(this: Model) {
      const raw = this.getDataValue(name) as string | number | null;
      return raw === null || raw === undefined ? raw : Number(raw);
    },
  };
}
