import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/**
 * The sign-in rate limiter's count for one limiter and client address in the current window,
 * shared by every server process on the database (server/middleware/database-rate-limit-store.ts).
 */
export class AuthAttempt extends Model<InferAttributes<AuthAttempt>, InferCreationAttributes<AuthAttempt>> {
  /** The limiter's prefix and the client address, e.g. `session:203.0.113.7`. */
  declare key: string;
  declare hits: number;
  /** When the window ends, in milliseconds since 1970 (compared in SQL on both dialects). */
  declare resetAtMs: number;

  static initModel(sequelize: Sequelize) {
    AuthAttempt.init(
      {
        key: { type: DataTypes.STRING(255), primaryKey: true },
        hits: { type: DataTypes.INTEGER, allowNull: false },
        resetAtMs: {
          type: DataTypes.BIGINT,
          allowNull: false,
          field: 'reset_at_ms',
          // PostgreSQL returns BIGINT as a string.
          get(this: AuthAttempt) {
            return Number(this.getDataValue('resetAtMs'));
          },
        },
      },
      { sequelize, tableName: 'auth_attempts', modelName: 'AuthAttempt', timestamps: false },
    );
  }
}
