import { Link } from 'react-router-dom';
import type { DueCheckAnswer } from '@shared/check-schedules/check-from-due';
import type { DueCheckView } from '@shared/views/check-schedules';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { StateBadge } from '@/components/ui/state-badge';
import { Table, Td, Th } from '@/components/ui/table';
import { ErrorState, Loading } from '@/components/ui/states';
import { ApiError } from '@/lib/api-client';
import { formatDate } from '@/lib/format';
import { useDueChecks } from '../api/get-due-checks';
import { useRecordDueCheck } from '../api/record-due-check';

const sampleKey = (d: DueCheckView) => `${d.recipeId}|${d.mixedAt}`;

/**
 * Samples whose next scheduled check has come (by the check schedule set on each recipe's page),
 * most overdue first. One click records today's look: "Still standing" repeats the last state,
 * "Collapsed" ends the sample's shelf life. Either way the sample's survival record stays honest.
 */
export function DueChecksPanel({ programmeId, canWrite }: { programmeId: number; canWrite: boolean }) {
  const due = useDueChecks(programmeId);
  const record = useRecordDueCheck();
  const busyKey = record.isPending && record.variables ? `${sampleKey(record.variables.due)}|${record.variables.answer}` : null;
  const answer = (item: DueCheckView, choice: DueCheckAnswer) => record.mutate({ due: item, answer: choice, programmeId });
  return (
    <section aria-labelledby="due-checks-heading" className="flex flex-col gap-3">
      <div className="flex flex-wrap items-baseline justify-between gap-3">
        <h2 id="due-checks-heading">Due checks</h2>
        {due.data && due.data.total > 0 && (
          <p className="text-sm text-ink-soft">
            {due.data.total} sample{due.data.total === 1 ? ' has' : 's have'} reached the next age on {due.data.total === 1 ? 'its' : 'their'} recipe's check schedule
            {due.data.total > due.data.items.length ? `; the ${due.data.items.length} most overdue are listed` : ''}.
          </p>
        )}
      </div>
      {record.isError && (
        <Notice tone="error" title="The check was not recorded">
          {record.error instanceof ApiError ? record.error.message : 'Try again.'}
        </Notice>
      )}
      {due.isPending ? (
        <Loading label="Finding samples due for a check…" />
      ) : due.isError ? (
        <ErrorState error={due.error} retry={() => due.refetch()} />
      ) : due.data.items.length === 0 ? (
        <p className="rounded-card border border-dashed border-line-strong bg-panel px-4 py-3 text-sm text-ink-soft" data-testid="no-due-checks">
          No sample is due for a check. A recipe's check schedule (on its page) says at which ages its samples are looked at again.
        </p>
      ) : (
        <Table caption="Samples due for a check, most overdue first">
          <thead>
            <tr>
              <Th>Recipe</Th>
              <Th>Mixed on</Th>
              <Th>Last check</Th>
              <Th className="text-right">Due at (days)</Th>
              <Th className="text-right">Age today (days)</Th>
              {canWrite && <Th>Record today's look</Th>}
            </tr>
          </thead>
          <tbody>
            {due.data.items.map((item) => {
              const what = `${item.recipeCode}, mixed ${formatDate(item.mixedAt)}, at ${item.ageTodayDays} days`;
              return (
                <tr key={sampleKey(item)} data-testid="due-check">
                  <Td>
                    <Link to={`/recipes/${item.recipeCode}`} className="font-medium">
                      {item.recipeCode}
                    </Link>
                    <span className="block text-xs text-ink-soft">{item.recipeName}</span>
                  </Td>
                  <Td className="whitespace-nowrap">{formatDate(item.mixedAt)}</Td>
                  <Td className="whitespace-nowrap">
                    <StateBadge state={item.lastCheck.observedState} /> <span className="text-xs text-ink-soft">at {item.lastCheck.ageDays} days</span>
                  </Td>
                  <Td className="text-right tabular-nums">{item.dueAgeDays}</Td>
                  <Td className="text-right tabular-nums">{item.ageTodayDays}</Td>
                  {canWrite && (
                    <Td>
                      <div className="flex flex-wrap gap-2">
                        <Button size="sm" variant="secondary" aria-label={`Still standing: ${what}`} busy={busyKey === `${sampleKey(item)}|standing`} disabled={record.isPending} onClick={() => answer(item, 'standing')}>
                          Still standing
                        </Button>
                        <Button size="sm" variant="danger" aria-label={`Collapsed: ${what}`} busy={busyKey === `${sampleKey(item)}|collapsed`} disabled={record.isPending} onClick={() => answer(item, 'collapsed')}>
                          Collapsed
                        </Button>
                      </div>
                    </Td>
                  )}
                </tr>
              );
            })}
          </tbody>
        </Table>
      )}
      {canWrite && <p className="text-xs text-ink-soft">“Still standing” records the state of the last check again, by eye, at today's age; “Collapsed” records the collapse. Either click counts once, however often it is pressed.</p>}
    </section>
  );
}
