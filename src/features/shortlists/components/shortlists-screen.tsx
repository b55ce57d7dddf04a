import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { SHORTLIST_STATUSES, type ShortlistStatus } from '@shared/states';
import type { ProgrammeView } from '@shared/views/programme';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { SelectInput } from '@/components/ui/inputs';
import { Card } from '@/components/ui/page';
import { useUrlParams } from '@/lib/use-url-params';
import { ShortlistForm } from './shortlist-form';
import { ShortlistList } from './shortlist-list';
import { STATUS_LABELS } from './shortlist-status';

/** A programme's shortlists, filtered by status as the address says, and a new one for those who may write. */
export function ShortlistsScreen({ programme, canWrite }: { programme: ProgrammeView; canWrite: boolean }) {
  const [params, setParams] = useUrlParams();
  const navigate = useNavigate();
  const [creating, setCreating] = useState(false);
  const raw = params.get('status');
  const status = SHORTLIST_STATUSES.includes(raw as ShortlistStatus) ? (raw as ShortlistStatus) : null;
  return (
    <div className="flex flex-col gap-5">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <Field label="Show" className="w-60">
          {(props) => (
            <SelectInput
              {...props}
              value={status ?? ''}
              onChange={(event) =>
                setParams((previous) => {
                  const next = new URLSearchParams(previous);
                  if (event.target.value) next.set('status', event.target.value);
                  else next.delete('status');
                  return next;
                })
              }
            >
              <option value="">Every status, grouped</option>
              {SHORTLIST_STATUSES.map((s) => (
                <option key={s} value={s}>
                  {STATUS_LABELS[s]}
                </option>
              ))}
            </SelectInput>
          )}
        </Field>
        {canWrite && !creating && <Button onClick={() => setCreating(true)}>New shortlist</Button>}
      </div>
      {canWrite && creating && (
        <Card title="New shortlist">
          <ShortlistForm
            key={programme.id}
            programmeId={programme.id}
            defaultTargetState={programme.goalState}
            onCancel={() => setCreating(false)}
            onSaved={(shortlist) => navigate(`/shortlists/${shortlist.id}`)}
          />
        </Card>
      )}
      <ShortlistList programmeId={programme.id} status={status} />
    </div>
  );
}
