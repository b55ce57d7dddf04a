import { useState } from 'react';
import type { LeftOutReason } from '@shared/calibration/types';
import { DEFAULT_CLASSIFIER_PARAMETERS, GEL_THRESHOLD_SOURCE } from '@shared/physics/map/classifier-parameters';
import { CALIBRATION_STATUS_LABELS, type CalibrationView } from '@shared/views/calibration';
import { Button } from '@/components/ui/button';
import { Badge } from '@/components/ui/page';
import { Notice } from '@/components/ui/notice';
import { formatDateTime } from '@/lib/format';
import { AgreementGrid } from './agreement-grid';
import { formatEstimate, formatInterval, formatShare, formatSigned } from './format-estimate';

const LEFT_OUT: Record<LeftOutReason, string> = {
  unclear: 'recorded as unclear',
  noAttraction: 'without a B2* (attraction beyond what the physics represents)',
  noMap: 'of recipes that could not be placed on a map',
  atGlass: 'at or above the glass line, where no gel is predicted',
  outOfReach: 'outside the binodal at every attraction on the map',
};

const VERDICT_TONE = { generalises: 'success', 'fits-only': 'warning', 'no-gain': 'info' } as const;
const STATUS_TONE = { proposed: 'fjord', accepted: 'leaf', superseded: 'neutral', withdrawn: 'neutral' } as const;

/** One fit: the values with their uncertainty, what it used, agreement before and after, the verdict, and Accept. */
export function CalibrationResult({
  calibration,
  canAccept,
  onAccept,
  accepting,
  error,
}: {
  calibration: CalibrationView;
  canAccept: boolean;
  onAccept: () => void;
  accepting: boolean;
  error: string | null;
}) {
  const [confirming, setConfirming] = useState(false);
  const { result } = calibration;
  const leftOut = (Object.entries(result.observations.leftOut) as [LeftOutReason, number][]).filter(([, n]) => n > 0);
  const threshold = calibration.estimates.gelB2Threshold;
  return (
    <div className="flex flex-col gap-4 text-sm" data-testid="calibration-result">
      <div className="flex flex-wrap items-center gap-2">
        <Badge tone={STATUS_TONE[calibration.status]}>{CALIBRATION_STATUS_LABELS[calibration.status]}</Badge>
        <span className="text-ink-soft">
          Fitted {formatDateTime(calibration.fittedAt)}
          {calibration.fittedBy ? ` by ${calibration.fittedBy.name}` : ''}
          {calibration.note ? ` — “${calibration.note}”` : ''}
        </span>
      </div>

      <dl className="grid gap-x-6 gap-y-2 sm:grid-cols-2" aria-label="Fitted values">
        <div>
          <dt className="text-xs font-semibold uppercase tracking-wide text-ink-soft">Attraction shift (B2*)</dt>
          <dd className="text-lg tabular-nums text-ink">{formatEstimate(calibration.estimates.attractionShift)}</dd>
          <dd className="text-xs text-ink-soft">95 % interval {formatInterval(calibration.estimates.attractionShift)}; positive: the samples behave as more attractive than computed</dd>
        </div>
        <div>
          <dt className="text-xs font-semibold uppercase tracking-wide text-ink-soft">Gel threshold inside the binodal (B2*)</dt>
          {threshold ? (
            <>
              <dd className="text-lg tabular-nums text-ink">{formatEstimate(threshold)}</dd>
              <dd className="text-xs text-ink-soft">95 % interval {formatInterval(threshold)} (profile likelihood); decides the call of {result.fit.thresholdDecides} observations</dd>
            </>
          ) : (
            <dd className="text-lg tabular-nums text-ink">
              {formatSigned(calibration.parameters.gelB2Threshold, 1)} <span className="text-sm text-ink-soft">held, not fitted</span>
            </dd>
          )}
          <dd className="text-xs text-ink-soft" data-testid="gel-threshold-default">
            Default B2* {formatSigned(DEFAULT_CLASSIFIER_PARAMETERS.gelB2Threshold, 1)}: {GEL_THRESHOLD_SOURCE}.
          </dd>
        </div>
        <div>
          <dt className="text-xs font-semibold uppercase tracking-wide text-ink-soft">Observations used</dt>
          <dd className="text-ink">
            {result.observations.used} of {result.observations.offered}: {result.observations.gelSide} on the gel side, {result.observations.notGelSide} not gel; {result.observations.inBand} between binodal and spinodal
          </dd>
          {leftOut.length > 0 && <dd className="text-xs text-ink-soft">Left out: {leftOut.map(([reason, n]) => `${n} ${LEFT_OUT[reason]}`).join('; ')}.</dd>}
        </div>
        <div>
          <dt className="text-xs font-semibold uppercase tracking-wide text-ink-soft">Gel side called right</dt>
          <dd className="text-ink">
            On these observations: theory {formatShare(calibration.accuracy.before)}, calibrated {formatShare(calibration.accuracy.after)}
          </dd>
          <dd className="text-ink">
            Held out ({calibration.crossValidated.folds}-fold cross-validation): theory {formatShare(calibration.crossValidated.before)}, calibrated {formatShare(calibration.crossValidated.after)}
          </dd>
        </div>
      </dl>

      <Notice tone={VERDICT_TONE[result.verdict.kind]} title={result.verdict.kind === 'generalises' ? 'The calibration generalises' : result.verdict.kind === 'fits-only' ? 'It fits, but may not predict' : 'No gain over the theory'}>
        <p data-testid="calibration-verdict">{result.verdict.text}</p>
      </Notice>

      <div className="grid gap-5 lg:grid-cols-2">
        <AgreementGrid table={result.agreement.before} caption="Before: published theory" />
        <AgreementGrid table={result.agreement.after} caption="After: calibrated" />
      </div>

      <details className="text-xs text-ink-soft">
        <summary className="cursor-pointer font-medium text-ink">How this was fitted</summary>
        <ul className="mt-1 list-disc space-y-0.5 pl-5">
          {result.notes.map((note) => (
            <li key={note}>{note}</li>
          ))}
          <li>Sharpness: the odds of a gel grow by e per {(1 / result.fit.sharpness.value).toFixed(2)} of B2* toward stronger attraction (β₁ = {formatEstimate(result.fit.sharpness)}).</li>
          <li>Physics model {calibration.modelVersion}.</li>
        </ul>
      </details>

      <p className="text-xs text-amber-700">Calibrated predictions are still approximate: the fit moves the theory's gel boundary to match this bench, within the uncertainty shown. Confirm critical recipes with stability tests.</p>

      {canAccept && calibration.status === 'proposed' && !confirming && (
        <div>
          <Button onClick={() => setConfirming(true)}>Accept this calibration…</Button>
        </div>
      )}
      {canAccept && calibration.status === 'proposed' && confirming && (
        <div className="rounded-md border border-fjord-300 bg-fjord-50 p-3" role="group" aria-label="Confirm accepting">
          <p className="text-fjord-700">Accepting makes this the programme's calibration: every recipe and ad-hoc observation is predicted again with it, the map draws it, and the calibration in use now (if any) moves to the history.</p>
          <div className="mt-2 flex gap-2">
            <Button busy={accepting} onClick={onAccept}>
              Accept and recompute predictions
            </Button>
            <Button variant="quiet" onClick={() => setConfirming(false)}>
              Not now
            </Button>
          </div>
        </div>
      )}
      {error && <Notice tone="error">{error}</Notice>}
    </div>
  );
}
