import { QueryTypes, type Sequelize } from 'sequelize';

/** Row counts of every table in this database: a test takes one before and after. */
export async function tableCounts(sequelize: Sequelize): Promise<Record<string, number>> {
  const tables = await sequelize.query<{ name: string }>(
    "SELECT table_name AS name FROM information_schema.tables WHERE table_schema = DATABASE() AND table_type = 'BASE TABLE'",
    { type: QueryTypes.SELECT },
  );
  const counts: Record<string, number> = {};
  for (const { name } of tables) {
    const [row] = await sequelize.query<{ n: number | bigint }>(`SELECT COUNT(*) AS n FROM \`${name}\``, { type: QueryTypes.SELECT });
    counts[name] = Number(row.n);
  }
  return counts;
}
