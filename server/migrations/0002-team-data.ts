import { DataTypes, type QueryInterface } from 'sequelize';

const id = { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true };
const timestamps = {
  created_at: { type: DataTypes.DATE(3), allowNull: false },
  updated_at: { type: DataTypes.DATE(3), allowNull: false },
};
const ref = (table: string, allowNull = false) => ({ type: DataTypes.INTEGER, allowNull, references: { model: table, key: 'id' } });
const archived = { archived_at: { type: DataTypes.DATE(3), allowNull: true } };
const price = { price_per_kg: { type: DataTypes.DOUBLE, allowNull: true } };
const notes = { notes: { type: DataTypes.TEXT, allowNull: true } };
const STATES = ['fluid', 'gel', 'glass', 'crystal', 'separated'];
const OBSERVED = [...STATES, 'collapsed', 'unclear'];

/** Programmes, the material library, recipes, bench observations, attachments, imports, shortlists. */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('programmes', {
    id,
    name: { type: DataTypes.STRING(120), allowNull: false },
    goal_state: { type: DataTypes.ENUM('fluid', 'gel', 'glass', 'crystal'), allowNull: false },
    attraction_source: { type: DataTypes.ENUM('depletion', 'salt', 'direct'), allowNull: false },
    code_prefix: { type: DataTypes.STRING(5), allowNull: false, unique: true },
    next_code_number: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
    ...notes,
    ...archived,
    created_by: ref('users', true),
    ...timestamps,
  });

  await qi.createTable('particle_systems', {
    id,
    name: { type: DataTypes.STRING(120), allowNull: false },
    core_material: { type: DataTypes.STRING(80), allowNull: false },
    radius_nm: { type: DataTypes.DOUBLE, allowNull: false },
    polydispersity_pct: { type: DataTypes.DOUBLE, allowNull: false },
    density_gcm3: { type: DataTypes.DOUBLE, allowNull: false },
    stabilisation: { type: DataTypes.ENUM('charge', 'steric', 'electrosteric', 'none'), allowNull: false },
    surface_potential_mv: { type: DataTypes.DOUBLE, allowNull: true },
    hamaker_zj: { type: DataTypes.DOUBLE, allowNull: true },
    ...price,
    ...notes,
    ...archived,
    created_by: ref('users', true),
    ...timestamps,
  });
  await qi.createTable('depletants', {
    id,
    name: { type: DataTypes.STRING(120), allowNull: false },
    molar_mass_kg_mol: { type: DataTypes.DOUBLE, allowNull: false },
    rg_nm: { type: DataTypes.DOUBLE, allowNull: true },
    rg_prefactor_nm: { type: DataTypes.DOUBLE, allowNull: true },
    rg_exponent: { type: DataTypes.DOUBLE, allowNull: true },
    ...price,
    ...notes,
    ...archived,
    created_by: ref('users', true),
    ...timestamps,
  });
  await qi.createTable('solvents', {
    id,
    name: { type: DataTypes.STRING(120), allowNull: false },
    viscosity_mpas: { type: DataTypes.DOUBLE, allowNull: false },
    density_gcm3: { type: DataTypes.DOUBLE, allowNull: false },
    temperature_c: { type: DataTypes.DOUBLE, allowNull: false },
    relative_permittivity: { type: DataTypes.DOUBLE, allowNull: true },
    ...price,
    ...notes,
    ...archived,
    created_by: ref('users', true),
    ...timestamps,
  });
  await qi.createTable('salts', {
    id,
    name: { type: DataTypes.STRING(120), allowNull: false },
    valence: { type: DataTypes.TINYINT, allowNull: false },
    molar_mass_g_mol: { type: DataTypes.DOUBLE, allowNull: true },
    ...price,
    ...notes,
    ...archived,
    created_by: ref('users', true),
    ...timestamps,
  });

  await qi.createTable('recipes', {
    id,
    code: { type: DataTypes.STRING(16), allowNull: false, unique: true },
    programme_id: ref('programmes'),
    name: { type: DataTypes.STRING(120), allowNull: false },
    particle_id: ref('particle_systems'),
    solvent_id: ref('solvents'),
    fraction_kind: { type: DataTypes.ENUM('mass', 'volume'), allowNull: false },
    fraction_value: { type: DataTypes.DOUBLE, allowNull: false },
    temperature_c: { type: DataTypes.DOUBLE, allowNull: false },
    attraction_source: { type: DataTypes.ENUM('depletion', 'salt', 'direct', 'none'), allowNull: false },
    depletant_id: ref('depletants', true),
    depletant_gl: { type: DataTypes.DOUBLE, allowNull: true },
    salt_id: ref('salts', true),
    salt_mm: { type: DataTypes.DOUBLE, allowNull: true },
    contact_energy_kt: { type: DataTypes.DOUBLE, allowNull: true },
    range_sigma: { type: DataTypes.DOUBLE, allowNull: true },
    ...notes,
    origin: { type: DataTypes.STRING(200), allowNull: true },
    // Derived with shared/physics on every save; the indexed few as columns, all of it in `derived`.
    phi: { type: DataTypes.DOUBLE, allowNull: false },
    reduced_b2: { type: DataTypes.DOUBLE, allowNull: true },
    predicted_state: { type: DataTypes.ENUM(...STATES), allowNull: true },
    margin: { type: DataTypes.DOUBLE, allowNull: true },
    model_version: { type: DataTypes.STRING(40), allowNull: false },
    derived: { type: DataTypes.JSON, allowNull: false },
    ...archived,
    created_by: ref('users', true),
    updated_by: ref('users', true),
    ...timestamps,
  });
  await qi.addIndex('recipes', ['programme_id', 'archived_at']);
  await qi.addIndex('recipes', ['predicted_state']);

  await qi.createTable('import_batches', {
    id: { type: DataTypes.STRING(36), primaryKey: true },
    idempotency_key: { type: DataTypes.STRING(200), allowNull: true },
    user_id: ref('users'),
    file_name: { type: DataTypes.STRING(255), allowNull: true },
    row_count: { type: DataTypes.INTEGER, allowNull: false },
    report: { type: DataTypes.JSON, allowNull: false },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await qi.addIndex('import_batches', ['user_id', 'idempotency_key'], { unique: true });

  await qi.createTable('observations', {
    id,
    programme_id: ref('programmes'),
    recipe_id: ref('recipes', true),
    adhoc_phi: { type: DataTypes.DOUBLE, allowNull: true },
    adhoc_reduced_b2: { type: DataTypes.DOUBLE, allowNull: true },
    adhoc_description: { type: DataTypes.STRING(300), allowNull: true },
    adhoc_predicted_state: { type: DataTypes.ENUM(...STATES), allowNull: true },
    mixed_at: { type: DataTypes.DATE(3), allowNull: false },
    age_days: { type: DataTypes.DOUBLE, allowNull: false },
    observed_state: { type: DataTypes.ENUM(...OBSERVED), allowNull: false },
    method: { type: DataTypes.ENUM('visual', 'rheology', 'microscopy', 'scattering'), allowNull: false },
    storage_modulus_pa: { type: DataTypes.DOUBLE, allowNull: true },
    yield_stress_pa: { type: DataTypes.DOUBLE, allowNull: true },
    settled_height_pct: { type: DataTypes.DOUBLE, allowNull: true },
    ...notes,
    observer_id: ref('users', true),
    import_batch_id: { type: DataTypes.STRING(36), allowNull: true, references: { model: 'import_batches', key: 'id' } },
    ...archived,
    ...timestamps,
  });
  await qi.addIndex('observations', ['programme_id', 'archived_at']);
  await qi.addIndex('observations', ['recipe_id']);

  await qi.createTable('attachments', {
    id,
    observation_id: ref('observations'),
    original_name: { type: DataTypes.STRING(255), allowNull: false },
    stored_name: { type: DataTypes.STRING(80), allowNull: false, unique: true },
    mime_type: { type: DataTypes.STRING(80), allowNull: false },
    size_bytes: { type: DataTypes.INTEGER, allowNull: false },
    sha256: { type: DataTypes.CHAR(64), allowNull: false },
    uploader_id: ref('users', true),
    ...archived,
    created_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await qi.addIndex('attachments', ['observation_id']);

  await qi.createTable('shortlists', {
    id,
    programme_id: ref('programmes'),
    title: { type: DataTypes.STRING(120), allowNull: false },
    purpose: { type: DataTypes.TEXT, allowNull: true },
    target_state: { type: DataTypes.ENUM('fluid', 'gel', 'glass', 'crystal'), allowNull: false },
    status: { type: DataTypes.ENUM('draft', 'submitted', 'approved', 'returned'), allowNull: false },
    author_id: ref('users', true),
    reviewer_id: ref('users', true),
    decision_comment: { type: DataTypes.TEXT, allowNull: true },
    submitted_at: { type: DataTypes.DATE(3), allowNull: true },
    decided_at: { type: DataTypes.DATE(3), allowNull: true },
    ...archived,
    ...timestamps,
  });
  await qi.addIndex('shortlists', ['programme_id', 'status']);
  await qi.createTable('shortlist_items', {
    id,
    shortlist_id: ref('shortlists'),
    recipe_id: ref('recipes'),
    position: { type: DataTypes.INTEGER, allowNull: false },
    reason: { type: DataTypes.TEXT, allowNull: false },
  });
  await qi.addIndex('shortlist_items', ['shortlist_id', 'recipe_id'], { unique: true });
  await qi.createTable('shortlist_events', {
    id,
    shortlist_id: ref('shortlists'),
    from_status: { type: DataTypes.ENUM('draft', 'submitted', 'approved', 'returned'), allowNull: true },
    to_status: { type: DataTypes.ENUM('draft', 'submitted', 'approved', 'returned'), allowNull: false },
    actor_id: ref('users', true),
    comment: { type: DataTypes.TEXT, allowNull: true },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await qi.addIndex('shortlist_events', ['shortlist_id']);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  for (const table of ['shortlist_events', 'shortlist_items', 'shortlists', 'attachments', 'observations', 'import_batches', 'recipes', 'salts', 'solvents', 'depletants', 'particle_systems', 'programmes']) {
    await qi.dropTable(table);
  }
}
