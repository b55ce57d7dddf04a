import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type ModelAttributes, type Sequelize } from 'sequelize';
import { STABILISATIONS, type Stabilisation } from '../../shared/states';

/** Columns every library entry has. */
const common = {
  id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
  name: { type: DataTypes.STRING(120), allowNull: false },
  pricePerKg: { type: DataTypes.DOUBLE, allowNull: true },
  notes: { type: DataTypes.TEXT, allowNull: true },
  archivedAt: { type: DataTypes.DATE(3), allowNull: true },
  createdBy: { type: DataTypes.INTEGER, allowNull: true },
  createdAt: DataTypes.DATE(3),
  updatedAt: DataTypes.DATE(3),
};
const num = (allowNull = false) => ({ type: DataTypes.DOUBLE, allowNull });

interface Common {
  id: CreationOptional<number>;
  name: string;
  pricePerKg: number | null;
  notes: string | null;
  archivedAt: CreationOptional<Date | null>;
  createdBy: number | null;
  createdAt: CreationOptional<Date>;
  updatedAt: CreationOptional<Date>;
}

export class ParticleSystem extends Model<InferAttributes<ParticleSystem>, InferCreationAttributes<ParticleSystem>> {
  declare id: Common['id'];
  declare name: string;
  declare coreMaterial: string;
  declare radiusNm: number;
  declare polydispersityPct: number;
  declare densityGcm3: number;
  declare stabilisation: Stabilisation;
  declare surfacePotentialMv: number | null;
  declare hamakerZj: number | null;
  declare pricePerKg: number | null;
  declare notes: string | null;
  declare archivedAt: Common['archivedAt'];
  declare createdBy: number | null;
  declare createdAt: Common['createdAt'];
  declare updatedAt: Common['updatedAt'];

  static initModel(sequelize: Sequelize) {
    ParticleSystem.init(
      {
        ...common,
        coreMaterial: { type: DataTypes.STRING(80), allowNull: false },
        radiusNm: num(),
        polydispersityPct: num(),
        densityGcm3: { ...num(), field: 'density_gcm3' },
        stabilisation: { type: DataTypes.ENUM(...STABILISATIONS), allowNull: false },
        surfacePotentialMv: num(true),
        hamakerZj: num(true),
      } as ModelAttributes<ParticleSystem>,
      { sequelize, tableName: 'particle_systems', modelName: 'ParticleSystem' },
    );
  }
}

export class Depletant extends Model<InferAttributes<Depletant>, InferCreationAttributes<Depletant>> {
  declare id: Common['id'];
  declare name: string;
  declare molarMassKgMol: number;
  declare rgNm: number | null;
  declare rgPrefactorNm: number | null;
  declare rgExponent: number | null;
  declare pricePerKg: number | null;
  declare notes: string | null;
  declare archivedAt: Common['archivedAt'];
  declare createdBy: number | null;
  declare createdAt: Common['createdAt'];
  declare updatedAt: Common['updatedAt'];

  static initModel(sequelize: Sequelize) {
    Depletant.init(
      { ...common, molarMassKgMol: { ...num(), field: 'molar_mass_kg_mol' }, rgNm: num(true), rgPrefactorNm: num(true), rgExponent: num(true) } as ModelAttributes<Depletant>,
      { sequelize, tableName: 'depletants', modelName: 'Depletant' },
    );
  }
}

export class Solvent extends Model<InferAttributes<Solvent>, InferCreationAttributes<Solvent>> {
  declare id: Common['id'];
  declare name: string;
  declare viscosityMPas: number;
  declare densityGcm3: number;
  declare temperatureC: number;
  declare relativePermittivity: number | null;
  declare pricePerKg: number | null;
  declare notes: string | null;
  declare archivedAt: Common['archivedAt'];
  declare createdBy: number | null;
  declare createdAt: Common['createdAt'];
  declare updatedAt: Common['updatedAt'];

  static initModel(sequelize: Sequelize) {
    Solvent.init(
      {
        ...common,
        viscosityMPas: { ...num(), field: 'viscosity_mpas' },
        densityGcm3: { ...num(), field: 'density_gcm3' },
        temperatureC: { ...num(), field: 'temperature_c' },
        relativePermittivity: num(true),
      } as ModelAttributes<Solvent>,
      { sequelize, tableName: 'solvents', modelName: 'Solvent' },
    );
  }
}

export class Salt extends Model<InferAttributes<Salt>, InferCreationAttributes<Salt>> {
  declare id: Common['id'];
  declare name: string;
  declare valence: number;
  declare molarMassGMol: number | null;
  declare pricePerKg: number | null;
  declare notes: string | null;
  declare archivedAt: Common['archivedAt'];
  declare createdBy: number | null;
  declare createdAt: Common['createdAt'];
  declare updatedAt: Common['updatedAt'];

  static initModel(sequelize: Sequelize) {
    Salt.init(
      { ...common, valence: { type: DataTypes.TINYINT, allowNull: false }, molarMassGMol: { ...num(true), field: 'molar_mass_g_mol' } } as ModelAttributes<Salt>,
      { sequelize, tableName: 'salts', modelName: 'Salt' },
    );
  }
}
