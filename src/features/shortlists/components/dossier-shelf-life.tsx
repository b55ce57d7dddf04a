import { useMemo } from 'react';
import { describeSurvival } from '@shared/shelf-life/describe-survival';
import { gelModuliFromChecks } from '@shared/shelf-life/gel-moduli-from-checks';
import { kaplanMeier } from '@shared/shelf-life/kaplan-meier';
import { MIN_STIFFENING_AGES, stiffeningWithAge } from '@shared/shelf-life/stiffening-with-age';
import { survivalRecordsFromChecks, type SampleCheck } from '@shared/shelf-life/survival-records-from-checks';
import { formatNumber } from '@/lib/format';

export type DossierCheck = SampleCheck & { storageModulusPa: number | null };

/**
 * A shortlisted recipe's life on the bench, for paper: the Kaplan–Meier summary of its gel samples
 * (median time to collapse with its 95 % interval, or how long they have stood without a collapse)
 * and its stiffening with age. Computed with the same shared functions as the recipe page.
 */
export function useDossierShelfLife(checks: readonly DossierCheck[] | undefined) {
  return useMemo(() => {
    if (!checks) return null;
    if (checks.length === 0) return { survival: 'no bench checks yet', stiffening: null };
    const survival = describeSurvival(kaplanMeier(survivalRecordsFromChecks(checks)));
    const fit = stiffeningWithAge(gelModuliFromChecks(checks));
    const stiffening =
      fit.status !== 'fitted'
        ? `too few ages with G′ for a trend (${fit.distinctAges} of ${MIN_STIFFENING_AGES})`
        : `G′ ${fit.slopePaPerDecade >= 0 ? '+' : '−'}${formatNumber(Math.abs(fit.slopePaPerDecade), 3)} Pa per tenfold age (95 % interval ${formatNumber(fit.low, 3)} to ${formatNumber(fit.high, 3)} Pa): ${fit.trend === 'stiffens' ? 'stiffens' : fit.trend === 'softens' ? 'softens — watch it' : 'no clear trend'}`;
    return { survival, stiffening };
  }, [checks]);
}

/** The summary table's cell: the survival summary in words. */
export function DossierShelfLifeCell({ checks }: { checks: readonly DossierCheck[] | undefined }) {
  const shelf = useDossierShelfLife(checks);
  return <span data-testid="dossier-shelf-life-cell">{shelf === null ? '…' : shelf.survival}</span>;
}

/** The recipe's block: survival and stiffening, with the method in one line. */
export function DossierShelfLife({ checks }: { checks: readonly DossierCheck[] | undefined }) {
  const shelf = useDossierShelfLife(checks);
  return (
    <div className="text-sm" data-testid="dossier-shelf-life">
      <p className="mt-3 text-xs font-semibold uppercase tracking-wide text-ink-soft">Shelf life on the bench</p>
      {shelf === null ? (
        <p>Loading…</p>
      ) : (
        <>
          <p>Survival: {shelf.survival}.</p>
          {shelf.stiffening && (
            <>
              <p>Stiffening: {shelf.stiffening}.</p>
              <p className="text-xs text-ink-soft">Kaplan–Meier over the recipe's gel samples (one per mixing date; censored at the last check), Greenwood's 95 % band; G′ fitted against log₁₀ age.</p>
            </>
          )}
        </>
      )}
    </div>
  );
}
