import { DataTypes, type ModelAttributeColumnOptions, type Model } from 'sequelize';

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
