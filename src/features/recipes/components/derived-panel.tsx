import type { RecipeDerived } from '@shared/views/recipe';
import { StateBadge } from '@/components/ui/state-badge';
import { formatNumber } from '@/lib/format';
import { SymbolText } from '@/components/ui/symbol-text';

interface Row {
  label: string;
  value: number | null;
  unit?: string;
  digits?: number;
  hint: string;
}

function rows(d: RecipeDerived): Row[] {
  return [
    { label: 'Volume fraction φ', value: d.phi, hint: 'Share of the sample volume taken by particles.' },
    { label: 'Size ratio q', value: d.sizeRatio, hint: 'Polymer radius of gyration over particle radius.' },
    { label: 'Polymer in reservoir φ_p^R', value: d.polymerReservoir, hint: 'Polymer volume fraction of a reservoir in equilibrium with the sample.' },
    { label: 'Polymer in sample φ_p', value: d.polymerSystem, hint: 'Polymer concentration over its overlap concentration.' },
    { label: 'Overlap concentration c*', value: d.overlapConcentrationGL, unit: 'g/L', hint: 'Where polymer coils start to touch.' },
    { label: 'Contact attraction U/kT', value: d.contactEnergyKT, hint: 'Depth of the pair attraction at contact, in units of thermal energy.' },
    { label: 'Attraction range', value: d.rangeSigma, unit: 'σ', hint: 'How far the attraction reaches, as a fraction of the particle diameter.' },
    { label: 'Reduced B2*', value: d.reducedB2, hint: 'Second virial coefficient over its hard-sphere value: 1 for no attraction, negative when sticky.' },
    { label: 'Baxter stickiness τ', value: d.stickiness, hint: 'Smaller is stickier.' },
    { label: 'Debye length', value: d.debyeLengthNm, unit: 'nm', hint: 'Reach of the electrostatic repulsion in this salt.' },
    { label: 'Diffusion coefficient', value: d.timescales.diffusionM2s, unit: 'm²/s', hint: 'Stokes–Einstein.' },
    { label: 'Brownian time', value: d.timescales.brownianTimeS, unit: 's', hint: 'Time to diffuse one radius.' },
    { label: 'Gravitational Péclet number', value: d.timescales.gravitationalPeclet, hint: 'Gravity over thermal motion at the particle scale; above 1, settling wins.' },
    { label: 'Stokes settling speed', value: d.timescales.settlingSpeedMs, unit: 'm/s', hint: 'Speed of a single particle falling through the solvent.' },
  ];
}

/** Everything the server derived for a recipe, with plain-words hints. */
export function DerivedPanel({ derived, title = 'Derived parameters' }: { derived: RecipeDerived; title?: string }) {
  return (
    <section aria-label={title}>
      <div className="mb-3 flex flex-wrap items-center gap-2">
        <span className="text-sm text-ink-soft">Predicted:</span>
        <StateBadge state={derived.predictedState} />
        {derived.calibration ? (
          <span className="text-xs text-ink-soft">calibrated {derived.calibration.acceptedAt.slice(0, 10)}</span>
        ) : (
          <span className="text-xs text-ink-soft">uncalibrated theory</span>
        )}
      </div>
      {derived.reason && <p className="mb-2 text-sm">{derived.reason}</p>}
      {derived.nearestBoundary && (
        <p className="mb-3 text-sm text-ink-soft">
          Nearest boundary: <strong className="text-ink">{derived.nearestBoundary.label}</strong>
          {derived.marginDescription ? <> — <SymbolText text={derived.marginDescription} /></> : ''}
        </p>
      )}
      {derived.warnings.length > 0 && (
        <ul className="mb-3 list-disc pl-5 text-sm text-amber-700">
          {derived.warnings.map((w) => (
            <li key={w}>{w}</li>
          ))}
        </ul>
      )}
      <dl className="grid grid-cols-1 gap-x-6 gap-y-1.5 text-sm sm:grid-cols-2">
        {rows(derived).map((row) => (
          <div key={row.label} className="flex items-baseline justify-between gap-3 border-b border-line/60 py-1" title={row.hint}>
            <dt className="text-ink-soft"><SymbolText text={row.label} /></dt>
            <dd className="tabular-nums">
              {formatNumber(row.value, row.digits ?? 3)}
              {row.value !== null && row.unit ? ` ${row.unit}` : ''}
            </dd>
          </div>
        ))}
      </dl>
      <p className="mt-3 text-xs text-ink-faint">
        Model {derived.modelVersion}
        {derived.closestApproachNm !== null ? ` · closest approach ${derived.closestApproachNm} nm` : ''}
      </p>
    </section>
  );
}
