import { DataTypes, type ModelAttributeColumnOptions, type Model } from 'sequelize';

/**
 * MariaDB stores JSON as LONGTEXT and the driver may hand it back as a string; this column
 * always reads as a parsed value.
 */
export function jsonColumn<T>(
  field: string,
  fallback: T,
  allowNull = false,
): ModelAttributeColumnOptions<Model> {
  return {
    type: DataTypes.JSON,
    allowNull,
    defaultValue: allowNull ? null : fallback,
    get(this: Model) {
      const raw = this.getDataValue(field as never) as unknown;
      if (raw == null) return allowNull ? null : fallback;
      if (typeof raw === 'string') {
        try {
          return JSON.parse(raw) as T;
        } catch {
          return fallback;
        }
      }
      return raw as T;
    },
  };
}
