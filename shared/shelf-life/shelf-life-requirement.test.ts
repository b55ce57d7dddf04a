import { describe, expect, it } from 'vitest';
import { shelfLifeCovariatesOf } from './shelf-life-covariates-of';
import type { ShelfLifeModelFitted } from './shelf-life-model';
import { shelfLifeRequestNote, shelfLifeVerdict } from './shelf-life-requirement';

// A model written by hand: H₀ = 0.2, 0.7, 1.5 at 10, 20, 40 days, centred on 5 kT, β = −0.5 per kT;
// the bench watched up to 60 days. Expected values by hand from S(t|x) = exp(−H₀(t)·e^{β(x − x̄)}) (derived).
const MODEL: ShelfLifeModelFitted = {
  status: 'fitted', terms: [], coefficients: { attractionKt: -0.5 },
  baseline: { timeDays: [10, 20, 40], cumulativeHazard: [0.2, 0.7, 1.5], centre: { attractionKt: 5 } },
  typical: { attractionKt: 5 }, sampleCount: 40, eventCount: 20, lastTimeDays: 60, omitted: [],
};

describe('shelfLifeVerdict', () => {
  it('at the centre (5 kT): median 20 days (H₀ = 0.7 is the first ≥ ln 2), meets 15 days (e^{−0.2} standing) but not 30 (e^{−0.7} = 0.4966 standing)', () => {
    expect(shelfLifeVerdict(MODEL, { attractionKt: 5, phi: 0.2, log10Peclet: null }, 15)).toEqual({ medianDays: 20, survivalAtMinimum: Math.exp(-0.2), meets: true });
    expect(shelfLifeVerdict(MODEL, { attractionKt: 5, phi: 0.2, log10Peclet: null }, 30)).toEqual({ medianDays: 20, survivalAtMinimum: Math.exp(-0.7), meets: false });
  });

  it('at 7 kT the hazard is e^{−1}: median beyond the watch, meets any N up to 60 days and cannot be judged beyond', () => {
    const strong = { attractionKt: 7, phi: 0.2, log10Peclet: null };
    expect(shelfLifeVerdict(MODEL, strong, 45)).toEqual({ medianDays: null, survivalAtMinimum: Math.exp(-1.5 * Math.exp(-1)), meets: true });
    expect(shelfLifeVerdict(MODEL, strong, 90)).toEqual({ medianDays: null, survivalAtMinimum: null, meets: null });
  });

  it('without a minimum gives only the median (3 kT: H₀ must reach ln 2 · e^{−1} = 0.255, first at 20 days)', () => {
    expect(shelfLifeVerdict(MODEL, { attractionKt: 3, phi: null, log10Peclet: null }, null)).toEqual({ medianDays: 20, survivalAtMinimum: null, meets: null });
  });
});

describe('shelfLifeRequestNote', () => {
  it('says a refused model cannot honour the minimum, in its own words', () => {
    const refused = { status: 'refused' as const, reason: 'too-few-events' as const, message: 'Cannot fit what drives collapse: 3 collapses seen; at least 10 are needed.', sampleCount: 5, eventCount: 3, lastTimeDays: 20, omitted: [] };
    expect(shelfLifeRequestNote(refused, 14)).toBe('Asked to stay a gel for at least 14 days: cannot be honoured. Cannot fit what drives collapse: 3 collapses seen; at least 10 are needed. The candidates are ranked as before.');
    expect(shelfLifeRequestNote(MODEL, 90)).toMatch(/at most 60 days, so a candidate whose median lies beyond that cannot be judged against 90 days\.$/);
  });
});

describe('shelfLifeCovariatesOf', () => {
  it('takes U/kT and φ as stored and the Péclet number in decades', () => {
    expect(shelfLifeCovariatesOf({ contactEnergyKT: 4, phi: 0.2, timescales: { gravitationalPeclet: 0.01 } })).toEqual({ attractionKt: 4, phi: 0.2, log10Peclet: -2 });
    expect(shelfLifeCovariatesOf({ contactEnergyKT: null, phi: 0.2, timescales: { gravitationalPeclet: null } }).log10Peclet).toBeNull();
  });
});
