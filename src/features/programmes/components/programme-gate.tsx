import type { ReactNode } from 'react';
import type { ProgrammeView } from '@shared/views/programme';
import { Card } from '@/components/ui/page';
import { EmptyState, ErrorState, Loading } from '@/components/ui/states';
import type { ProgrammeSelection } from '../hooks/use-programme-param';
import { ProgrammeForm } from './programme-form';

/**
 * Shows the programme list's loading, error and empty states, and the screen once a
 * programme is chosen. With `canCreate` (role has `programmes.write`) the empty state
 * offers the form to start the first programme.
 */
export function ProgrammeGate({ selection, canCreate, children }: { selection: ProgrammeSelection; canCreate: boolean; children: (programme: ProgrammeView) => ReactNode }) {
  if (selection.isPending) return <Loading label="Loading programmes…" />;
  if (selection.error) return <ErrorState error={selection.error} retry={selection.refetch} />;
  if (!selection.programme) {
    return (
      <div className="flex flex-col gap-5">
        <EmptyState title="No programme yet">
          Everything in Gelwright belongs to a programme: a product line with a goal state.{' '}
          {canCreate ? 'Start the first one below.' : 'A programme manager starts one.'}
        </EmptyState>
        {canCreate && (
          <Card title="Start a programme">
            <ProgrammeForm onCreated={(programme) => selection.setProgrammeId(programme.id)} />
          </Card>
        )}
      </div>
    );
  }
  return <>{children(selection.programme)}</>;
}
