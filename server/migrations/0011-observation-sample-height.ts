import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * The fill height of a sample in its vial or tube (mm), optional on every bench check. Taller
 * samples of a weak gel collapse sooner (Starrs, Poon, Hibberd & Robins, J. Phys.: Condens.
 * Matter 14, 2485 (2002)), so the shelf-life model of what drives collapse can use it once it is
 * recorded. Nullable: checks recorded before it existed, or without it, have no height.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn('observations', 'sample_height_mm', { type: DataTypes.DOUBLE, allowNull: true });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.removeColumn('observations', 'sample_height_mm');
}
