import { describe, expect, it } from 'vitest';
import { PhysicsArgumentError } from '../validation/physics-argument-error';
import { expectRelative } from '../test-support/expect-relative';
import { logDepletionContactEnergy, logFreeVolumeFraction } from './depletion-contact-energy';
import { freeVolumeFraction } from '../depletion/free-volume-fraction';
import { requireDepletionWithinModel, type DepletionRecipeFacts } from './require-depletion-within-model';

/**
 * 30 nm particles with 100 kg/mol polymer of R_g = 17.7 nm (q = 0.59), c* = 7.148924 g/L
 * (3M/(4πN_A R_g³): derived, reference/derive-check-values.py, depletion_recipe_limits).
 */
function buildFacts(overrides: Partial<DepletionRecipeFacts> = {}): DepletionRecipeFacts {
  return {
    phi: 0.3, q: 17.7 / 30, radiusNm: 30, radiusOfGyrationNm: 17.7, concentrationGL: 1,
    overlapGL: 7.14892414992993, basis: 'solvent', fractionArgument: 'fraction.value', ...overrides,
  };
}

function thrownBy(run: () => void): PhysicsArgumentError {
  try {
    run();
  } catch (error) {
    expect(error).toBeInstanceOf(PhysicsArgumentError);
    return error as PhysicsArgumentError;
  }
  throw new Error('expected a PhysicsArgumentError');
}

describe('logDepletionContactEnergy', () => {
  it('equals ln[φ_p(1 + 3/(2q))/α(φ)] where α is representable', () => {
    // ln α against the direct α(0.3, 0.1) = 0.6019477900 (physics.md §4, derived).
    expectRelative(logFreeVolumeFraction(0.3, 0.1), Math.log(0.6019477900), 1e-9);
    const facts = buildFacts();
    const direct = ((1 - 0.3) / facts.overlapGL / freeVolumeFraction(0.3, facts.q)) * (1 + 3 / (2 * facts.q));
    expectRelative(logDepletionContactEnergy(0.3, facts.q, 1, facts.overlapGL, 'solvent'), Math.log(direct), 1e-13);
  });

  it('stays finite where α underflows, and is −Infinity without polymer', () => {
    // q = 20/3 at φ = 0.5: α ≈ e^-1700, far below the smallest double.
    expect(freeVolumeFraction(0.5, 20 / 3)).toBe(0);
    expect(Number.isFinite(logDepletionContactEnergy(0.5, 20 / 3, 1, 1.3, 'solvent'))).toBe(true);
    expect(logDepletionContactEnergy(0.5, 20 / 3, 0, 1.3, 'solvent')).toBe(-Infinity);
  });
});

describe('requireDepletionWithinModel', () => {
  it('lets a recipe through while its contact attraction stays within 600 kT', () => {
    // φ_max = 0.5307490 for 1 g/L per solvent (derived, depletion_recipe_limits).
    expect(() => requireDepletionWithinModel(buildFacts({ phi: 0.53 }))).not.toThrow();
    expect(() => requireDepletionWithinModel(buildFacts({ phi: 0.6, concentrationGL: 0 }))).not.toThrow();
  });

  it('names the particle fraction when the free volume runs out, with the largest φ that fits', () => {
    const error = thrownBy(() => requireDepletionWithinModel(buildFacts({ phi: 0.55 })));
    expect(error.argument).toBe('fraction.value');
    // U(φ = 0.55, 1 g/L per solvent) = 1593.83 kT and φ_max = 0.530749 (derived, depletion_recipe_limits).
    expect(error.message).toContain('1594 kT');
    expect(error.message).toContain('below φ = 0.531');
    expect(error.message.startsWith('Particle fraction too high')).toBe(true);
  });

  it('names the depletant concentration when even dilute particles would exceed the limit', () => {
    const error = thrownBy(() => requireDepletionWithinModel(buildFacts({ concentrationGL: 5000, basis: 'sample' })));
    expect(error.argument).toBe('depletant.concentrationGL');
    // U(φ = 0.3, 5000 g/L per sample) = 20236.3 kT; 600 kT is reached at 148.248 g/L (derived, depletion_recipe_limits).
    expect(error.message).toContain('20236 kT');
    expect(error.message).toContain('at most 148 g/L');
  });

  it('explains an underflowing free volume in finite words, naming the fraction field it came from', () => {
    // 3 nm particles with 20 nm coils (q ≈ 6.7) at φ = 0.5: the case that used to report "got Infinity".
    const error = thrownBy(() => requireDepletionWithinModel(buildFacts({ phi: 0.5, q: 20 / 3, radiusNm: 3, radiusOfGyrationNm: 20, overlapGL: 1.3, fractionArgument: 'fraction.value (as φ)' })));
    expect(error.argument).toBe('fraction.value (as φ)');
    expect(error.message).toMatch(/about 10\^\d+ kT/);
    expect(error.message).not.toMatch(/NaN|Infinity/);
  });
});
