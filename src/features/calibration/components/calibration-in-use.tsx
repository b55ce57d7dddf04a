import { DEFAULT_CLASSIFIER_PARAMETERS, GEL_THRESHOLD_SOURCE } from '@shared/physics/map/classifier-parameters';
import type { CalibrationSummaryView } from '@shared/views/calibration';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { formatDate } from '@/lib/format';
import { formatEstimate, formatSigned } from './format-estimate';

/** What the programme predicts with now, and (for managers and admins) the way back to the theory. */
export function CalibrationInUse({
  inUse,
  canWithdraw,
  onWithdraw,
  withdrawing,
  error,
  confirming,
  onConfirming,
}: {
  inUse: CalibrationSummaryView | null;
  canWithdraw: boolean;
  onWithdraw: () => void;
  withdrawing: boolean;
  error: string | null;
  /** Whether the withdrawal waits for confirmation (the history's row action opens it too). */
  confirming: boolean;
  onConfirming: (confirming: boolean) => void;
}) {
  if (!inUse) {
    return (
      <div className="text-sm" data-testid="calibration-in-use">
        <p className="font-medium text-ink">Uncalibrated theory</p>
        <p className="mt-1 text-ink-soft">
          Predictions use the published theory with Gelwright's default rule: no attraction shift, and inside the binodal a gel at or below B2* = {formatSigned(DEFAULT_CLASSIFIER_PARAMETERS.gelB2Threshold, 1)} ({GEL_THRESHOLD_SOURCE}).
        </p>
      </div>
    );
  }
  return (
    <div className="flex flex-col gap-2 text-sm" data-testid="calibration-in-use">
      <p className="font-medium text-ink">
        Calibrated {formatDate(inUse.acceptedAt!)}
        {inUse.acceptedBy ? `, accepted by ${inUse.acceptedBy.name}` : ''}
      </p>
      <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5 text-ink-soft">
        <dt>Attraction shift</dt>
        <dd className="tabular-nums text-ink">{formatEstimate(inUse.estimates.attractionShift)} in B2*</dd>
        <dt>Gel threshold</dt>
        <dd className="tabular-nums text-ink">{inUse.estimates.gelB2Threshold ? `B2* ${formatEstimate(inUse.estimates.gelB2Threshold)}` : `B2* ${formatSigned(inUse.parameters.gelB2Threshold, 1)} (default, not fitted)`}</dd>
        <dt>Default</dt>
        <dd className="text-ink" data-testid="gel-threshold-default">B2* {formatSigned(DEFAULT_CLASSIFIER_PARAMETERS.gelB2Threshold, 1)}: {GEL_THRESHOLD_SOURCE}</dd>
        <dt>Fitted to</dt>
        <dd className="text-ink">{inUse.observationsUsed} observations, {formatDate(inUse.fittedAt)}</dd>
      </dl>
      {canWithdraw && !confirming && (
        <Button variant="secondary" size="sm" className="self-start" onClick={() => onConfirming(true)}>
          Withdraw the calibration…
        </Button>
      )}
      {canWithdraw && confirming && (
        <div className="rounded-md border border-line-strong bg-paper p-3" role="group" aria-label="Confirm withdrawing">
          <p>Every recipe and ad-hoc observation of the programme is predicted again with the uncalibrated theory. The calibration stays in the history.</p>
          <div className="mt-2 flex gap-2">
            <Button variant="danger" size="sm" busy={withdrawing} onClick={onWithdraw}>
              Withdraw and use the theory
            </Button>
            <Button variant="quiet" size="sm" onClick={() => onConfirming(false)}>
              Keep it
            </Button>
          </div>
        </div>
      )}
      {error && <Notice tone="error">{error}</Notice>}
    </div>
  );
}
