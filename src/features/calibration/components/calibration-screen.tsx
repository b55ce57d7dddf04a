import { useEffect, useRef, useState } from 'react';
import type { ProgrammeView } from '@shared/views/programme';
import { Card } from '@/components/ui/page';
import { EmptyState, ErrorState, Loading } from '@/components/ui/states';
import { Notice } from '@/components/ui/notice';
import { ApiError } from '@/lib/api-client';
import { useAcceptCalibration } from '../api/accept-calibration';
import { useCalibration } from '../api/get-calibration';
import { useCalibrations } from '../api/get-calibrations';
import { useWithdrawCalibration } from '../api/withdraw-calibration';
import { CalibrationHistory } from './calibration-history';
import { CalibrationInUse } from './calibration-in-use';
import { CalibrationResult } from './calibration-result';
import { FitForm } from './fit-form';

const messageOf = (error: unknown) => (error instanceof ApiError ? error.message : error ? 'Something went wrong. Try again.' : null);

/**
 * The Calibrate screen for one programme: what it predicts with now, a fit to the bench, the
 * chosen fit in full, and the history. `onPredictionsChanged` runs after an accept or withdrawal
 * (the route refreshes the other screens' data).
 */
export function CalibrationScreen({ programme, canFit, canAccept, onPredictionsChanged }: { programme: ProgrammeView; canFit: boolean; canAccept: boolean; onPredictionsChanged: () => void }) {
  const list = useCalibrations(programme.id);
  const [selectedId, setSelectedId] = useState<number | null>(null);
  const [changed, setChanged] = useState<string | null>(null);
  const [confirmingWithdraw, setConfirmingWithdraw] = useState(false);
  const inUseCard = useRef<HTMLDivElement>(null);
  const newest = list.data?.items[0]?.id ?? null;
  useEffect(() => {
    setSelectedId(null);
    setConfirmingWithdraw(false);
  }, [programme.id]);
  const shownId = selectedId ?? newest;
  const selected = useCalibration(programme.id, shownId);
  const accept = useAcceptCalibration(programme.id, onPredictionsChanged);
  const withdraw = useWithdrawCalibration(programme.id, onPredictionsChanged);

  if (list.isPending) return <Loading label="Loading the programme's calibrations…" />;
  if (list.isError) return <ErrorState error={list.error} retry={() => list.refetch()} />;
  const { items, inUse } = list.data;
  const recomputedText = (what: string, r: { recipes: number; observations: number; changedStates: number }) =>
    `${what}: ${r.recipes} recipe${r.recipes === 1 ? '' : 's'} and ${r.observations} ad-hoc observation${r.observations === 1 ? '' : 's'} predicted again; ${r.changedStates} changed state.`;

  return (
    <div className="flex flex-col gap-5">
      {changed && <Notice tone="success">{changed}</Notice>}
      <div className="grid items-start gap-5 lg:grid-cols-2">
        <div ref={inUseCard}>
          <Card title="In use">
            <CalibrationInUse
              inUse={inUse}
              canWithdraw={canAccept}
              confirming={confirmingWithdraw}
              onConfirming={setConfirmingWithdraw}
              withdrawing={withdraw.isPending}
              error={messageOf(withdraw.error)}
              onWithdraw={() =>
                withdraw.mutate(undefined, {
                  onSuccess: ({ recomputed }) => {
                    setConfirmingWithdraw(false);
                    setChanged(recomputedText('Back to the uncalibrated theory', recomputed));
                  },
                })
              }
            />
          </Card>
        </div>
        {canFit && (
          <Card title="Fit to the bench">
            <FitForm
              programmeId={programme.id}
              onFitted={(calibration) => {
                setChanged(null);
                setSelectedId(calibration.id);
              }}
            />
          </Card>
        )}
      </div>

      <Card title="Fit">
        {shownId === null ? (
          <EmptyState title="No calibration fitted yet">{canFit ? 'Fit the boundary to the bench above to see how well the theory agrees with your observations.' : 'A formulator, scientist or manager can fit one to the bench.'}</EmptyState>
        ) : selected.isPending ? (
          <Loading label="Loading the fit…" />
        ) : selected.isError ? (
          <ErrorState error={selected.error} retry={() => selected.refetch()} />
        ) : (
          <CalibrationResult
            calibration={selected.data}
            canAccept={canAccept}
            accepting={accept.isPending}
            error={messageOf(accept.error)}
            onAccept={() => accept.mutate(selected.data.id, { onSuccess: ({ recomputed }) => setChanged(recomputedText('Calibration accepted', recomputed)) })}
          />
        )}
      </Card>

      {items.length > 0 && (
        <section aria-labelledby="calibration-history-heading">
          <h2 id="calibration-history-heading" className="mb-2 text-lg">
            History
          </h2>
          <CalibrationHistory
            items={items}
            selectedId={shownId}
            onSelect={setSelectedId}
            onWithdraw={
              canAccept
                ? () => {
                    setConfirmingWithdraw(true);
                    inUseCard.current?.scrollIntoView({ block: 'center' });
                  }
                : undefined
            }
          />
        </section>
      )}
    </div>
  );
}
