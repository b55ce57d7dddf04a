import { describe, expect, it } from 'vitest';
import * as physics from './index';

describe('shared/physics index', () => {
  it('exports every function the issue names, with its argument count', () => {
    // Issue 3 fixes these names and argument orders; other parts of the product call them.
    const arities: Record<string, number> = {
      carnahanStarlingCompressibility: 1,
      carnahanStarlingExcessFreeEnergy: 1,
      carnahanStarlingExcessChemicalPotential: 1,
      hardSphereFluidSolidCoexistence: 0,
      squareWellReducedB2: 2,
      reducedB2FromStickiness: 1,
      stickinessFromReducedB2: 1,
      asakuraOosawaContactEnergy: 2,
      reducedB2FromPotential: 2,
      baxterPYLambda: 2,
      baxterPYSpinodalStickiness: 1,
      baxterPYCriticalPoint: 0,
      baxterPercolationStickiness: 1,
      meanFieldCriticalPoint: 0,
      meanFieldBinodal: 1,
      meanFieldSpinodal: 1,
      freeVolumeFraction: 2,
      freeVolumeCriticalPoint: 1,
      freeVolumeFluidFluidBinodal: 2,
      freeVolumeFluidSolidCoexistence: 2,
      freeVolumeCriticalEndpoint: 0,
      buildStateMap: 1,
      classifyPoint: 3, // (map, point, parameters?)
      signedBoundaryDistance: 3,
      attractionToMapY: 2,
      deriveRecipeParameters: 1,
    };
    const exported = physics as unknown as Record<string, unknown>;
    for (const [name, arity] of Object.entries(arities)) {
      expect(typeof exported[name], name).toBe('function');
      expect((exported[name] as (...args: unknown[]) => unknown).length, name).toBe(arity);
    }
    expect(physics.PHYSICS_MODEL_VERSION).toMatch(/^gw-physics-\d+$/);
    expect(physics.DEFAULT_CLASSIFIER_PARAMETERS.glassPhi).toBe(0.58);
    expect(physics.DEFAULT_CLASSIFIER_PARAMETERS.polydispersityCrystalThreshold).toBe(12);
  });
});
