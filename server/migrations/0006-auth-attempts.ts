import { DataTypes, type QueryInterface } from 'sequelize';

type Ctx = { context: QueryInterface };

/** Sign-in rate limiter counts kept in the database, so every server process shares them. */
export async function up({ context: qi }: Ctx) {
  await qi.createTable('auth_attempts', {
    key: { type: DataTypes.STRING(255), primaryKey: true },
    hits: { type: DataTypes.INTEGER, allowNull: false },
    reset_at_ms: { type: DataTypes.BIGINT, allowNull: false },
  });
  // The sweep of ended windows deletes by reset time.
  await qi.addIndex('auth_attempts', ['reset_at_ms'], { name: 'auth_attempts_reset_at_ms' });
}

export async function down({ context: qi }: Ctx) {
  await qi.dropTable('auth_attempts');
}
