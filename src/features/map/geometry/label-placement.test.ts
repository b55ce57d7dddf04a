import { describe, expect, it } from 'vitest';
import { markerLabelSpot, overlaps, placeLineLabels, regionLabelSpot, type Box, type LineLabelSpot } from './label-placement';
import { mapScales } from './scales';
import type { XY } from './types';

// A 400 × 300 px plot of the unit square, no margins: x px = 400 x, y px = 300 (1 − y).
const scales = mapScales({ width: 400, height: 300, margin: { top: 0, right: 0, bottom: 0, left: 0 } }, { x: [0, 1], y: [0, 1] });

/** n points along a straight line from a to b, in map coordinates. */
const straight = (a: XY, b: XY, n = 120): XY[] => Array.from({ length: n }, (_, i) => [a[0] + ((b[0] - a[0]) * i) / (n - 1), a[1] + ((b[1] - a[1]) * i) / (n - 1)]);

/** Eight lines fanning out from the lower left, crossing the plot, so their labels compete for room. */
const fan = Array.from({ length: 8 }, (_, i) => ({ id: `line-${i}`, label: `Boundary number ${i + 1}`, points: straight([0, 0.1 * i], [1, 1 - 0.08 * i]) }));

/** The box a placed line label takes (the same 5.8 px per character the placement assumes). */
function boxOf(spot: LineLabelSpot, label: string): Box {
  const width = label.length * 5.8;
  return spot.anchor === 'start' ? { x0: spot.x, y0: spot.y - 11, x1: spot.x + width, y1: spot.y + 2 } : { x0: spot.x - width, y0: spot.y - 11, x1: spot.x, y1: spot.y + 2 };
}

const inside = (b: Box) => b.x0 >= 0 && b.y0 >= 0 && b.x1 <= scales.inner.width && b.y1 <= scales.inner.height;

describe('placeLineLabels', () => {
  it('labels crowded lines without any two labels overlapping, every label inside the plot', () => {
    const spots = placeLineLabels(fan, scales);
    expect(spots.size).toBeGreaterThan(3);
    const boxes = [...spots.entries()].map(([id, spot]) => boxOf(spot, fan.find((l) => l.id === id)!.label));
    for (const box of boxes) expect(inside(box)).toBe(true);
    for (let i = 0; i < boxes.length; i++) for (let j = i + 1; j < boxes.length; j++) expect(overlaps(boxes[i], boxes[j])).toBe(false);
  });

  it('keeps off the reserved boxes (marker and region labels), and leaves a line unlabelled when no spot is free', () => {
    const reserved: Box[] = [{ x0: 0, y0: 0, x1: 400, y1: 150 }];
    const spots = placeLineLabels(fan, scales, reserved);
    for (const [id, spot] of spots) expect(overlaps(boxOf(spot, fan.find((l) => l.id === id)!.label), reserved[0])).toBe(false);
    expect(placeLineLabels(fan, scales, [{ x0: 0, y0: 0, x1: 400, y1: 300 }]).size).toBe(0);
  });

  it('leaves a line hugging the top edge unlabelled rather than let its label poke out of the plot', () => {
    // 15 px below the top: visible, but a label above it would start 1 px outside.
    const top = [{ id: 'top', label: 'Glass line', points: straight([0.1, 0.95], [0.9, 0.95]) }];
    expect(placeLineLabels(top, scales).size).toBe(0);
  });

  it('is deterministic: the same lines give the same spots', () => {
    expect([...placeLineLabels(fan, scales).entries()]).toEqual([...placeLineLabels(fan, scales).entries()]);
  });

  it('names lines that share a label once', () => {
    const twins = [
      { id: 'a', label: 'Gel boundary', points: straight([0, 0.2], [1, 0.4]) },
      { id: 'b', label: 'Gel boundary', points: straight([0, 0.7], [1, 0.9]) },
    ];
    expect([...placeLineLabels(twins, scales).keys()]).toEqual(['a']);
  });

  it('anchors a label at its end when it would run past the right edge', () => {
    const edge = [{ id: 'edge', label: 'A long name near the right edge', points: straight([0.95, 0.2], [0.98, 0.8]) }];
    const spot = placeLineLabels(edge, scales).get('edge')!;
    expect(spot.anchor).toBe('end');
    expect(inside(boxOf(spot, edge[0].label))).toBe(true);
  });
});

describe('markerLabelSpot', () => {
  it('puts the label right of the marker, left of it near the right edge, and nowhere when neither side fits', () => {
    expect(markerLabelSpot({ x: 0.1, y: 0.5, label: 'Critical point (φ 0.13)' }, scales)).toMatchObject({ anchor: 'start', dx: 7 });
    expect(markerLabelSpot({ x: 0.95, y: 0.5, label: 'Critical point' }, scales)).toMatchObject({ anchor: 'end', dx: -7 });
    expect(markerLabelSpot({ x: 0.5, y: 0.5, label: 'x'.repeat(40) }, scales)).toBeNull();
  });

  it('measures the name without its parenthesised numbers', () => {
    const spot = markerLabelSpot({ x: 0.1, y: 0.5, label: 'Critical point (φ 0.13, B2* −1.2)' }, scales)!;
    // 'Critical point' is 14 characters at 6 px: the box runs from 6 px left of the marker to 10 px past the text.
    expect(spot.box.x1 - spot.box.x0).toBe(14 * 6 + 16);
  });
});

describe('regionLabelSpot', () => {
  it("takes the region's own spot when free and moves a line down or up off a marker's label", () => {
    const region = { labelAt: [0.5, 0.5] as XY };
    expect(regionLabelSpot(region, 'Gel', scales, [])).toMatchObject({ x: 200, y: 150 });
    const markerBox: Box = { x0: 180, y0: 130, x1: 220, y1: 155 };
    const moved = regionLabelSpot(region, 'Gel', scales, [markerBox])!;
    expect(overlaps(moved.box, markerBox)).toBe(false);
    expect(moved.y).toBe(168);
  });

  it('is null when the spot is too near the left or right edge, or the region has none', () => {
    expect(regionLabelSpot({ labelAt: [0.01, 0.5] }, 'Fluid', scales, [])).toBeNull();
    expect(regionLabelSpot({ labelAt: [0.99, 0.5] }, 'Fluid', scales, [])).toBeNull();
    expect(regionLabelSpot({ labelAt: null }, 'Fluid', scales, [])).toBeNull();
  });
});
