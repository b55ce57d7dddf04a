import { useMemo } from 'react';
import { describeSurvival } from '@shared/shelf-life/describe-survival';
import { gelModuliFromChecks } from '@shared/shelf-life/gel-moduli-from-checks';
import { kaplanMeier } from '@shared/shelf-life/kaplan-meier';
import { MIN_STIFFENING_AGES, stiffeningWithAge } from '@shared/shelf-life/stiffening-with-age';
import { survivalRecordsFromChecks, type SampleCheck } from '@shared/shelf-life/survival-records-from-checks';
import { formatNumber } from '@/lib/format';
import { SurvivalCurveChart } from './survival-curve';

/**
 * How long this recipe's gels lasted on the bench, and whether they stiffen as they age: the Kaplan–Meier curve of its samples (a
 * sample is one mixing date; collapsed at its first collapsed check, else still standing at its
 * last check), with Greenwood's 95 % band (log(−log) transform) and the median in plain words.
 */
export function BenchSurvival({ checks }: { checks: Array<SampleCheck & { storageModulusPa: number | null }> | null }) {
  const curve = useMemo(() => (checks ? kaplanMeier(survivalRecordsFromChecks(checks)) : null), [checks]);
  const stiffening = useMemo(
    () => (checks ? stiffeningWithAge(gelModuliFromChecks(checks)) : null),
    [checks],
  );
  if (curve === null) return <p className="text-ink-soft">Loading the bench checks…</p>;
  const summary = describeSurvival(curve);
  return (
    <div className="flex flex-col gap-2" data-testid="bench-survival">
      <p>
        <span className="text-ink-soft">On the bench: </span>
        <strong>{summary.charAt(0).toUpperCase() + summary.slice(1)}.</strong>
      </p>
      {curve.sampleCount > 0 && <SurvivalCurveChart curve={curve} label={`Share of this recipe's gel samples still standing against age: ${summary}`} />}
      <p data-testid="stiffening">
        <span className="text-ink-soft">Stiffening: </span>
        {stiffening === null || stiffening.status !== 'fitted'
          ? `needs storage moduli of gel samples at ${MIN_STIFFENING_AGES} or more different ages${stiffening ? ` (${stiffening.distinctAges} so far)` : ''}.`
          : `G′ ${stiffening.slopePaPerDecade >= 0 ? 'rises' : 'falls'} by ${formatNumber(Math.abs(stiffening.slopePaPerDecade), 3)} Pa per tenfold age (95 % interval ${formatNumber(stiffening.low, 3)} to ${formatNumber(stiffening.high, 3)} Pa; ${stiffening.pointCount} measurements) — ${stiffening.trend === 'stiffens' ? 'it stiffens as it ages' : stiffening.trend === 'softens' ? 'it softens as it ages: watch it' : 'no clear trend yet'}.`}
      </p>
      <p className="text-xs text-ink-soft">
        Kaplan–Meier estimate (Kaplan & Meier 1958) with Greenwood's 95 % band; samples still standing at their last check count as censored (ticks), so record a check whenever you look at a sample. Weak gels can stand for a while and then collapse suddenly (Starrs et al. 2002). Ageing gels commonly stiffen roughly with the logarithm of their age (common practice): the slope is a least-squares fit of G′ against log₁₀ age.
      </p>
    </div>
  );
}
