import { STATE_LABELS } from '@shared/states';
import { Button } from '@/components/ui/button';
import { EmptyState, ErrorState, Loading } from '@/components/ui/states';
import { Table, Td, Th } from '@/components/ui/table';
import { formatDateTime } from '@/lib/format';
import { usePlans } from '../api/get-plans';

/** A programme's plans, newest first, so anyone can see what was planned and what came of it. */
export function PlanHistory({ programmeId, current, onOpen }: { programmeId: number; current: number | null; onOpen: (id: number) => void }) {
  const plans = usePlans(programmeId);
  if (plans.isPending) return <Loading label="Loading plans…" />;
  if (plans.isError) return <ErrorState error={plans.error} retry={() => plans.refetch()} />;
  if (plans.data.items.length === 0) return <EmptyState title="No plans yet">A formulator's plans are listed here, with the recipes made from each.</EmptyState>;
  return (
    <Table caption="Plans of this programme">
      <thead>
        <tr>
          <Th>Planned</Th>
          <Th>Plan</Th>
          <Th>Target</Th>
          <Th>Candidates</Th>
          <Th>Recipes made</Th>
          <Th>Model</Th>
          <Th>By</Th>
          <Th><span className="sr-only">Open</span></Th>
        </tr>
      </thead>
      <tbody>
        {plans.data.items.map((p) => (
          <tr key={p.id} data-plan={p.id} className={p.id === current ? 'bg-fjord-50' : ''}>
            <Td className="whitespace-nowrap">{formatDateTime(p.createdAt)}</Td>
            <Td>
              <span className="font-medium">{p.id}</span> · {p.title}
            </Td>
            <Td>{STATE_LABELS[p.targetState]}</Td>
            <Td>{p.feasible ? p.candidateCount : 'none (advice)'}</Td>
            <Td>{p.recipeCount}</Td>
            <Td>{p.calibrationId ? `calibration ${p.calibrationId}` : 'theory'}</Td>
            <Td>{p.createdBy?.name ?? '—'}</Td>
            <Td>
              <Button size="sm" variant="quiet" onClick={() => onOpen(p.id)} disabled={p.id === current}>
                {p.id === current ? 'Shown' : 'Open'}
                <span className="sr-only"> plan {p.id}</span>
              </Button>
            </Td>
          </tr>
        ))}
      </tbody>
    </Table>
  );
}
