import { CALIBRATION_STATUS_LABELS, type CalibrationSummaryView } from '@shared/views/calibration';
import { Button } from '@/components/ui/button';
import { Table, Td, Th } from '@/components/ui/table';
import { formatDateTime } from '@/lib/format';
import { formatEstimate, formatShare } from './format-estimate';

/** Every calibration of the programme, newest first, with who did what and when. */
export function CalibrationHistory({
  items,
  selectedId,
  onSelect,
  onWithdraw,
}: {
  items: CalibrationSummaryView[];
  selectedId: number | null;
  onSelect: (id: number) => void;
  /** Offered on the calibration in use, for the roles that may withdraw it. */
  onWithdraw?: () => void;
}) {
  return (
    <Table caption="Calibration history">
      <thead>
        <tr>
          <Th>Fitted</Th>
          <Th>Status</Th>
          <Th className="text-right">Shift (B2*)</Th>
          <Th className="text-right">Gel threshold</Th>
          <Th className="text-right">Used</Th>
          <Th className="text-right">Held out: theory → calibrated</Th>
          <Th>
            <span className="sr-only">Open</span>
          </Th>
        </tr>
      </thead>
      <tbody>
        {items.map((c) => (
          <tr key={c.id} className={c.id === selectedId ? 'bg-fjord-50' : undefined}>
            <Td>
              {formatDateTime(c.fittedAt)}
              <span className="block text-xs text-ink-soft">{c.fittedBy?.name ?? 'unknown'}</span>
            </Td>
            <Td>
              {CALIBRATION_STATUS_LABELS[c.status]}
              {c.acceptedAt && <span className="block text-xs text-ink-soft">accepted {formatDateTime(c.acceptedAt)}{c.acceptedBy ? ` by ${c.acceptedBy.name}` : ''}</span>}
              {c.endedAt && <span className="block text-xs text-ink-soft">{c.status === 'withdrawn' ? 'withdrawn' : 'replaced'} {formatDateTime(c.endedAt)}{c.endedBy ? ` by ${c.endedBy.name}` : ''}</span>}
            </Td>
            <Td className="whitespace-nowrap text-right tabular-nums">{formatEstimate(c.estimates.attractionShift)}</Td>
            <Td className="whitespace-nowrap text-right tabular-nums">{c.estimates.gelB2Threshold ? formatEstimate(c.estimates.gelB2Threshold) : `${c.parameters.gelB2Threshold} (held)`}</Td>
            <Td className="text-right tabular-nums">{c.observationsUsed}</Td>
            <Td className="whitespace-nowrap text-right tabular-nums">
              {formatShare(c.crossValidated.before)} → {formatShare(c.crossValidated.after)}
            </Td>
            <Td>
              <div className="flex gap-1">
                <Button variant="quiet" size="sm" onClick={() => onSelect(c.id)} aria-pressed={c.id === selectedId} aria-label={`Show the fit of ${formatDateTime(c.fittedAt)}`}>
                  Show
                </Button>
                {c.status === 'accepted' && onWithdraw && (
                  <Button variant="quiet" size="sm" onClick={onWithdraw}>
                    Withdraw…
                  </Button>
                )}
              </div>
            </Td>
          </tr>
        ))}
      </tbody>
    </Table>
  );
}
