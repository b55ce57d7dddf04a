import { describe, expect, it } from 'vitest';
import { pickRecipeMaterials } from './pick-recipe-materials';

// Invented library rows; the rule is Gelwright's own (which rows a recipe names).
const rows = { particles: [{ id: 1, name: 'silica' }], solvents: [{ id: 2, name: 'water' }], depletants: [{ id: 3, name: 'PEG' }], salts: [{ id: 4, name: 'NaCl' }] };
const byId = <M extends { id: number }>(list: M[]) => (id: number) => list.find((m) => m.id === id);
const lookup = { particle: byId(rows.particles), solvent: byId(rows.solvents), depletant: byId(rows.depletants), salt: byId(rows.salts) };

describe('pickRecipeMaterials', () => {
  it('takes the particle, solvent and only the material the attraction names', () => {
    expect(pickRecipeMaterials({ particleId: 1, solventId: 2, attraction: { source: 'depletion', depletantId: 3 } }, lookup)).toEqual({ particle: rows.particles[0], solvent: rows.solvents[0], depletant: rows.depletants[0], salt: null });
    expect(pickRecipeMaterials({ particleId: 1, solventId: 2, attraction: { source: 'salt', saltId: 4 } }, lookup)).toEqual({ particle: rows.particles[0], solvent: rows.solvents[0], depletant: null, salt: rows.salts[0] });
    expect(pickRecipeMaterials({ particleId: 1, solventId: 2, attraction: { source: 'direct' } }, lookup)).toEqual({ particle: rows.particles[0], solvent: rows.solvents[0], depletant: null, salt: null });
  });

  it('names the first field that points nowhere, particle before solvent before the attraction', () => {
    expect(pickRecipeMaterials({ particleId: 9, solventId: 9, attraction: { source: 'salt', saltId: 9 } }, lookup)).toEqual({ missing: { field: 'particleId', message: 'no such particle system' } });
    expect(pickRecipeMaterials({ particleId: 1, solventId: 9, attraction: { source: 'salt', saltId: 9 } }, lookup)).toEqual({ missing: { field: 'solventId', message: 'no such solvent' } });
    expect(pickRecipeMaterials({ particleId: 1, solventId: 2, attraction: { source: 'depletion', depletantId: 9 } }, lookup)).toEqual({ missing: { field: 'attraction.depletantId', message: 'no such depletant' } });
    expect(pickRecipeMaterials({ particleId: 1, solventId: 2, attraction: { source: 'salt', saltId: 9 } }, lookup)).toEqual({ missing: { field: 'attraction.saltId', message: 'no such salt' } });
  });
});
