import type { MapModel } from './types';
import { DEFAULT_SQUARE_WELL_RANGE } from './resolve-map-model';
import { inverseStickinessFromReducedB2 } from '../attraction/inverse-stickiness-from-reduced-b2';

type GenericModel = Extract<MapModel, { kind: 'generic' }>;

/**
 * y coordinate of a generic map for a given B2*: B2* itself, 1/τ = 4(1 − B2*), or the depth
 * U = ln[1 + (1 − B2*)/(λ³ − 1)] of the square well of range λ with that B2* (Noro & Frenkel,
 * J. Chem. Phys. 113, 2941 (2000)). Defined for every finite B2* (B2* > 1 gives y below the
 * hard-sphere value: negative 1/τ or U, i.e. off the bottom of the map). Internal, unchecked.
 */
export function genericYFromB2(model: GenericModel, b2: number): number {
  switch (model.axis) {
    case 'b2':
      return b2;
    case 'inverseTau':
      return inverseStickinessFromReducedB2(b2);
    case 'squareWellDepth': {
      const shell = (model.lambda ?? DEFAULT_SQUARE_WELL_RANGE) ** 3 - 1;
      const argument = (1 - b2) / shell;
      // Below e^U − 1 = −1 no well reproduces B2*: clamp far below the map.
      return argument > -1 ? Math.log1p(argument) : -50;
    }
  }
}

/** Inverse of genericYFromB2 (internal, unchecked). */
export function genericB2FromY(model: GenericModel, y: number): number {
  switch (model.axis) {
    case 'b2':
      return y;
    case 'inverseTau':
      return 1 - y / 4;
    case 'squareWellDepth':
      return 1 - ((model.lambda ?? DEFAULT_SQUARE_WELL_RANGE) ** 3 - 1) * Math.expm1(y);
  }
}
