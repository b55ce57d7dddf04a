import { useMemo } from 'react';
import { describeSurvival } from '@shared/shelf-life/describe-survival';
import { kaplanMeier } from '@shared/shelf-life/kaplan-meier';
import { survivalRecordsFromChecks, type SampleCheck } from '@shared/shelf-life/survival-records-from-checks';
import { SurvivalCurveChart } from './survival-curve';

/**
 * How long this recipe's gels lasted on the bench: the Kaplan–Meier curve of its samples (a
 * sample is one mixing date; collapsed at its first collapsed check, else still standing at its
 * last check), with Greenwood's 95 % band (log(−log) transform) and the median in plain words.
 */
export function BenchSurvival({ checks }: { checks: SampleCheck[] | null }) {
  const curve = useMemo(() => (checks ? kaplanMeier(survivalRecordsFromChecks(checks)) : null), [checks]);
  if (curve === null) return <p className="text-ink-soft">Loading the bench checks…</p>;
  const summary = describeSurvival(curve);
  return (
    <div className="flex flex-col gap-2" data-testid="bench-survival">
      <p>
        <span className="text-ink-soft">On the bench: </span>
        <strong>{summary.charAt(0).toUpperCase() + summary.slice(1)}.</strong>
      </p>
      {curve.sampleCount > 0 && <SurvivalCurveChart curve={curve} label={`Share of this recipe's gel samples still standing against age: ${summary}`} />}
      <p className="text-xs text-ink-soft">
        Kaplan–Meier estimate (Kaplan & Meier 1958) with Greenwood's 95 % band; samples still standing at their last check count as censored (ticks), so record a check whenever you look at a sample. Weak gels can stand for a while and then collapse suddenly (Starrs et al. 2002).
      </p>
    </div>
  );
}
