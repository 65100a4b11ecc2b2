import { DataTypes, type QueryInterface } from 'sequelize';

type Ctx = { context: QueryInterface };

/**
 * A catalogue heatsink's natural-convection exponent n: Rθsa(ΔT) = Rθsa,ref (ΔTref/ΔT)^n.
 * Null stands for the laminar default, n = 1/4.
 */
export async function up({ context: qi }: Ctx) {
  await qi.addColumn('heatsinks', 'convection_exponent', { type: DataTypes.DOUBLE, allowNull: true });
}

export async function down({ context: qi }: Ctx) {
  // On SQLite, removeColumn copies the table into a new one and loses its index and the
  // team's ON DELETE CASCADE; SQLite 3.35+ drops a column in place, as PostgreSQL does.
  if (qi.sequelize.getDialect() === 'sqlite') await qi.sequelize.query('ALTER TABLE "heatsinks" DROP COLUMN "convection_exponent"');
  else await qi.removeColumn('heatsinks', 'convection_exponent');
}
