import { randomBytes } from 'node:crypto';
import { UniqueConstraintError } from 'sequelize';
import { PNG } from 'pngjs';
import type { RecipeInput } from '../../shared/schemas/recipes';
import { Depletant, ParticleSystem, Programme, Salt, Solvent } from '../../server/models';

/** A random five-letter code prefix (the column holds five): 24⁵ ≈ 8 million of them. */
function randomPrefix() {
  const letters = 'ABCDEFGHJKLMNPQRSTUVWXYZ';
  return Array.from(randomBytes(5), (b) => letters[b % letters.length]).join('');
}

/**
 * A programme with a code prefix no other programme of the database has: a worker's database
 * keeps every file's programmes, so a random prefix is retried when it is taken.
 */
export async function buildProgramme(overrides: Partial<{ name: string; goalState: Programme['goalState']; attractionSource: Programme['attractionSource'] }> = {}) {
  for (let attempt = 0; ; attempt++) {
    try {
      return await Programme.create({
        name: overrides.name ?? `Programme ${randomBytes(3).toString('hex')}`,
        goalState: overrides.goalState ?? 'gel',
        attractionSource: overrides.attractionSource ?? 'depletion',
        codePrefix: randomPrefix(),
        notes: null,
        createdBy: null,
      });
    } catch (error) {
      if (!(error instanceof UniqueConstraintError) || attempt >= 5) throw error;
    }
  }
}

/**
 * A small library with typical values: 100 nm silica-like spheres, PEG with the
 * Devanand–Selser Rg law (physics.md §6), water at 25 °C (IAPWS viscosity), NaCl.
 */
export async function buildLibrary() {
  const particle = await ParticleSystem.create({ name: `Silica 100 nm ${randomBytes(2).toString('hex')}`, coreMaterial: 'silica', radiusNm: 100, polydispersityPct: 5, densityGcm3: 2.0, stabilisation: 'charge', surfacePotentialMv: -40, hamakerZj: 8, pricePerKg: 120, notes: null, createdBy: null });
  const depletant = await Depletant.create({ name: `PEG 20k ${randomBytes(2).toString('hex')}`, molarMassKgMol: 20, rgNm: null, rgPrefactorNm: 0.0215, rgExponent: 0.583, pricePerKg: 40, notes: null, createdBy: null });
  const solvent = await Solvent.create({ name: `Water ${randomBytes(2).toString('hex')}`, viscosityMPas: 0.89002, densityGcm3: 0.997, temperatureC: 25, relativePermittivity: 78.4, pricePerKg: 0.01, notes: null, createdBy: null });
  const salt = await Salt.create({ name: `NaCl ${randomBytes(2).toString('hex')}`, valence: 1, molarMassGMol: 58.44, pricePerKg: 1, notes: null, createdBy: null });
  return { particle, depletant, solvent, salt };
}

export type Library = Awaited<ReturnType<typeof buildLibrary>>;

export function recipeInput(programme: Programme, lib: Library, overrides: Partial<RecipeInput> = {}): RecipeInput {
  return {
    programmeId: programme.id,
    name: `Recipe ${randomBytes(3).toString('hex')}`,
    particleId: lib.particle.id,
    solventId: lib.solvent.id,
    fraction: { kind: 'volume', value: 0.2 },
    temperatureC: 25,
    attraction: { source: 'depletion', depletantId: lib.depletant.id, concentrationGL: 10 },
    ...overrides,
  };
}

/** A real PNG of the given size (pngjs), for upload tests. */
export function pngBytes(width = 8, height = 8): Buffer {
  const png = new PNG({ width, height });
  for (let i = 0; i < png.data.length; i += 4) {
    png.data[i] = (i * 7) % 255;
    png.data[i + 1] = 120;
    png.data[i + 2] = 200;
    png.data[i + 3] = 255;
  }
  return PNG.sync.write(png);
}

/** The first bytes of a Linux executable (ELF header), as an upload that must be refused. */
export function elfBytes(): Buffer {
  const header = Buffer.alloc(64);
  Buffer.from([0x7f, 0x45, 0x4c, 0x46, 2, 1, 1, 0]).copy(header);
  header.writeUInt16LE(2, 16);
  header.writeUInt16LE(0x3e, 18);
  return header;
}
