import { useState } from 'react';
import type { RecipeDerived } from '@shared/views/recipe';
import { Field } from '@/components/ui/field';
import { TextInput } from '@/components/ui/inputs';
import { formatNumber } from '@/lib/format';
import { NEARBY, type NearbyEvidence } from './nearby-evidence';

function duration(seconds: number) {
  if (!Number.isFinite(seconds)) return 'never (neutrally buoyant)';
  const days = seconds / 86_400;
  if (days < 1) return `${formatNumber(seconds / 3600, 2)} hours`;
  if (days < 60) return `${formatNumber(days, 2)} days`;
  return `${formatNumber(days / 365.25, 2)} years`;
}

/**
 * Shelf-life indicators with their inputs (not a promise): how strongly gravity competes with
 * thermal motion, how long a lone particle takes to fall the sample height, how far the recipe
 * sits from the gel boundary, and what the bench saw near it as samples aged.
 * Relations: Stokes settling v = 2a²Δρg/(9η); gravitational Péclet number
 * Pe_g = (4π/3)a⁴Δρg/kT; Stokes–Einstein D = kT/(6πηa) (physics.md §6). Weak gels can hold for
 * a delay time and then collapse suddenly (Starrs, Poon, Hibberd, Robins, J. Phys.: Condens.
 * Matter 14, 2485 (2002), from memory); the team's own collapse observations are the best guide.
 */
export function ShelfLifePanel({ derived, evidence }: { derived: RecipeDerived; evidence: NearbyEvidence | null }) {
  const [heightMm, setHeightMm] = useState(100);
  const speed = derived.timescales.settlingSpeedMs;
  const peclet = derived.timescales.gravitationalPeclet;
  const settle = speed === null || speed === 0 ? Infinity : (heightMm / 1000) / Math.abs(speed);
  const gel = derived.predictedState === 'gel';
  const onEdge = derived.margin !== null && derived.margin < 0.05;
  return (
    <section aria-label="Shelf-life indicators" className="flex flex-col gap-3 text-sm">
      <Field label="Sample height (mm)" className="w-40">
        {(p) => <TextInput {...p} type="number" min={1} step={5} value={heightMm} onChange={(e) => setHeightMm(Math.max(1, Number(e.target.value) || 1))} />}
      </Field>
      <dl className="grid grid-cols-[minmax(10rem,14rem)_1fr] gap-x-4 gap-y-2">
        <dt className="text-ink-soft">Gravitational Péclet number</dt>
        <dd>
          <strong className="tabular-nums">{formatNumber(peclet, 3)}</strong> —{' '}
          {peclet === null ? 'unknown' : peclet < 0.01 ? 'thermal motion far outweighs gravity for a single particle.' : peclet < 1 ? 'gravity is felt but thermal motion still wins for a single particle.' : 'gravity wins: a fluid sample sediments, and a gel must carry the weight.'}
        </dd>
        <dt className="text-ink-soft">Stokes settling speed</dt>
        <dd className="tabular-nums">
          {formatNumber(speed, 3)} m/s{speed !== null && speed < 0 ? ' (the particles cream upward)' : ''}
        </dd>
        <dt className="text-ink-soft">Time for a free particle to fall {heightMm} mm</dt>
        <dd>{duration(settle)}{gel ? ' — in a gel the network holds the particles up; it collapses only if the network yields or coarsens.' : ''}</dd>
        <dt className="text-ink-soft">Margin to the nearest boundary</dt>
        <dd>
          {formatNumber(derived.margin, 2)} {derived.nearestBoundary ? `to the ${derived.nearestBoundary.label.toLowerCase()}` : ''}
          {onEdge ? ' — on a knife edge: small changes in dose or temperature can change the state.' : ''}
        </dd>
        <dt className="text-ink-soft">The bench near this recipe</dt>
        <dd>
          {evidence === null
            ? 'Loading…'
            : evidence.recipes === 0
              ? 'No other recipe of the programme lies near this one yet.'
              : `${evidence.recipes} nearby recipe${evidence.recipes === 1 ? '' : 's'}: ${evidence.collapsed.length} collapse observation${evidence.collapsed.length === 1 ? '' : 's'}${evidence.collapsed.length ? ` (first at day ${evidence.collapsed[0].ageDays}, ${evidence.collapsed[0].code})` : ''}; ${evidence.heldGels} gel observation${evidence.heldGels === 1 ? '' : 's'} holding at 30 days or more.`}
        </dd>
      </dl>
      <p className="text-xs text-ink-soft">
        Indicators, not a shelf-life promise. Settling from Stokes' law for one particle; Péclet number from the particle's buoyant weight over kT/a. "Nearby" means within Δφ = {NEARBY.phi} and ΔB2* = {NEARBY.b2} (or {NEARBY.b2Relative * 100} % of B2*) — Gelwright's own rule. Confirm with a stability test on the real sample.
      </p>
    </section>
  );
}
