import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/page';
import { BenchLog } from './bench-log';
import { CsvImport } from './csv-import';
import { DueChecksPanel } from './due-checks-panel';
import { RecordOutcomeForm } from './record-outcome-form';

type Panel = 'record' | 'import' | null;

/**
 * The bench log of one programme; for roles with `observations.write`, a panel above it to
 * record one outcome or import a batch; then the samples due for a check (one click records
 * the look). The log stays in view underneath.
 */
export function BenchScreen({ programmeId, canWrite }: { programmeId: number; canWrite: boolean }) {
  const [panel, setPanel] = useState<Panel>(null);
  const toggle = (next: Exclude<Panel, null>) => setPanel((open) => (open === next ? null : next));
  return (
    <div className="flex flex-col gap-6">
      {canWrite && (
        <div className="flex flex-wrap gap-2">
          <Button variant={panel === 'record' ? 'primary' : 'secondary'} aria-expanded={panel === 'record'} aria-controls="bench-panel" onClick={() => toggle('record')}>
            Record an outcome
          </Button>
          <Button variant={panel === 'import' ? 'primary' : 'secondary'} aria-expanded={panel === 'import'} aria-controls="bench-panel" onClick={() => toggle('import')}>
            Import from CSV
          </Button>
        </div>
      )}
      {canWrite && panel && (
        <div id="bench-panel">
          <Card
            title={panel === 'record' ? 'Record an outcome' : 'Import a batch from CSV'}
            actions={
              <Button variant="quiet" size="sm" onClick={() => setPanel(null)}>
                Close
              </Button>
            }
          >
            {panel === 'record' ? <RecordOutcomeForm key={programmeId} programmeId={programmeId} /> : <CsvImport />}
          </Card>
        </div>
      )}
      <DueChecksPanel programmeId={programmeId} canWrite={canWrite} />
      <BenchLog programmeId={programmeId} />
    </div>
  );
}
