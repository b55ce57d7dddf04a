import { DataTypes, type QueryInterface } from 'sequelize';

const ref = (table: string, allowNull = false) => ({ type: DataTypes.INTEGER, allowNull, references: { model: table, key: 'id' } });
const STATUSES = ['proposed', 'accepted', 'superseded', 'withdrawn'];

/**
 * Calibrations of a programme's gel boundary to its bench observations: every fit is kept (the
 * history), at most one per programme is accepted at a time — enforced by a unique index on a
 * stored generated column that holds the programme id only while the row is accepted.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('calibrations', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    programme_id: ref('programmes'),
    status: { type: DataTypes.ENUM(...STATUSES), allowNull: false, defaultValue: 'proposed' },
    attraction_shift: { type: DataTypes.DOUBLE, allowNull: false },
    attraction_shift_se: { type: DataTypes.DOUBLE, allowNull: false },
    gel_b2_threshold: { type: DataTypes.DOUBLE, allowNull: false },
    gel_b2_threshold_se: { type: DataTypes.DOUBLE, allowNull: true },
    observation_count: { type: DataTypes.INTEGER, allowNull: false },
    cv_accuracy_before: { type: DataTypes.DOUBLE, allowNull: false },
    cv_accuracy_after: { type: DataTypes.DOUBLE, allowNull: false },
    method: { type: DataTypes.STRING(24), allowNull: false },
    model_version: { type: DataTypes.STRING(40), allowNull: false },
    result: { type: DataTypes.JSON, allowNull: false },
    note: { type: DataTypes.TEXT, allowNull: true },
    fitted_by: ref('users', true),
    accepted_by: ref('users', true),
    accepted_at: { type: DataTypes.DATE(3), allowNull: true },
    ended_by: ref('users', true),
    ended_at: { type: DataTypes.DATE(3), allowNull: true },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await qi.addIndex('calibrations', ['programme_id', 'status'], { name: 'calibrations_programme_status' });
  await qi.sequelize.query(
    "ALTER TABLE calibrations ADD COLUMN accepted_programme_id INT AS (IF(status = 'accepted', programme_id, NULL)) STORED, ADD UNIQUE INDEX calibrations_one_accepted (accepted_programme_id)",
  );
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('calibrations');
}
