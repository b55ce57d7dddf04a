import { describe, expect, it } from 'vitest';
import { gelOnset } from '@shared/calibration/gel-onset';
import { gelOnsetProfile } from '@shared/calibration/gel-onset-profile';
import { Z_95 } from '@shared/calibration/wald-estimate';
import { buildStateMap } from '@shared/physics/map/build-state-map';
import { DEFAULT_CLASSIFIER_PARAMETERS } from '@shared/physics/map/classifier-parameters';
import { highestGlassPhi } from '@shared/physics/map/glass-line-table';
import { calibrationLines } from './calibration-lines';

// Expected positions are derived from the rule itself: the gel boundary at φ is the B2* where a
// sample enters the gel region (shared/calibration gelOnset), moved by the shift; the B2* axis is
// drawn flipped (ŷ = −B2*), see from-state-map.

const map = buildStateMap({ kind: 'generic', theory: 'meanField', axis: 'b2' });
const profile = gelOnsetProfile(map, 60);
const calibration = { parameters: { attractionShift: 0.5, gelB2Threshold: -3 }, shiftStandardError: 0.1, dateLabel: '3 Mar 2026' };

describe('calibrationLines', () => {
  it('draws the calibrated boundary at the theory boundary moved by the shift, with a band of ±1.96 SE', () => {
    const lines = calibrationLines(map, profile, calibration, false);
    expect(lines.map((l) => l.id)).toEqual(['calibrated-gel', 'calibrated-gel-weak', 'calibrated-gel-strong']);
    const i = profile.findIndex((p) => p.phi > 0.25);
    const phi = profile[i].phi;
    const theory = Math.max(gelOnset(map, phi, 1e-4).spinodalB2!, Math.min(-3, gelOnset(map, phi, 1e-4).binodalB2!));
    const [centre, weak, strong] = lines.map((l) => l.points[i]);
    expect(centre[0]).toBe(phi);
    expect(-centre[1]).toBeCloseTo(theory + 0.5, 3);
    expect(-weak[1]).toBeCloseTo(theory + 0.5 + Z_95 * 0.1, 3);
    expect(-strong[1]).toBeCloseTo(theory + 0.5 - Z_95 * 0.1, 3);
    expect(lines.every((l) => l.tone === 'calibrated')).toBe(true);
    expect(lines[1].dashed && lines[2].dashed && !lines[0].dashed).toBe(true);
    expect(lines[0].label).toContain('3 Mar 2026');
  });

  it('adds the uncalibrated boundary when the map itself is drawn calibrated, and breaks where no gel is reached', () => {
    // The default gel threshold, so that the two lines differ by the shift alone.
    const lines = calibrationLines(map, profile, { ...calibration, parameters: { attractionShift: 0.5, gelB2Threshold: DEFAULT_CLASSIFIER_PARAMETERS.gelB2Threshold } }, true);
    const theoryLine = lines.find((l) => l.id === 'theory-gel')!;
    const i = profile.findIndex((p) => p.phi > 0.25);
    expect(-theoryLine.points[i][1]).toBeCloseTo(-lines[0].points[i][1] - 0.5, 3);
    // Beyond the glass line no φ is sampled; every sampled φ below it is inside the binodal at the top here.
    expect(profile.every((p) => p.phi < highestGlassPhi(map))).toBe(true);
    expect(theoryLine.points.filter(([, y]) => Number.isNaN(y)).length).toBe(profile.filter((p) => p.onset.binodalB2 === null).length);
  });
});
