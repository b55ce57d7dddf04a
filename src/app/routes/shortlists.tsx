import { useState } from 'react';
import { useLocation, useNavigate } from 'react-router-dom';
import { can } from '@shared/permissions';
import { SHORTLIST_STATUSES, type ShortlistStatus } from '@shared/states';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { SelectInput } from '@/components/ui/inputs';
import { Notice } from '@/components/ui/notice';
import { Card, PageHeader } from '@/components/ui/page';
import { useSession } from '@/features/auth/api/get-session';
import { ProgrammeGate, ProgrammePicker, useProgrammeParam } from '@/features/programmes';
import { ShortlistForm } from '@/features/shortlists/components/shortlist-form';
import { ShortlistList } from '@/features/shortlists/components/shortlist-list';
import { STATUS_LABELS } from '@/features/shortlists/components/shortlist-status';
import { useUrlParams } from '@/lib/use-url-params';

export function ShortlistsRoute() {
  const { data: user } = useSession();
  const selection = useProgrammeParam();
  const [params, setParams] = useUrlParams();
  const navigate = useNavigate();
  const location = useLocation();
  const [creating, setCreating] = useState(false);
  const raw = params.get('status');
  const status = SHORTLIST_STATUSES.includes(raw as ShortlistStatus) ? (raw as ShortlistStatus) : null;
  const notice = (location.state as { notice?: string } | null)?.notice;
  if (!user) return null;
  const canWrite = can(user.role, 'shortlists.write');
  return (
    <>
      <PageHeader
        title="Shortlists"
        subtitle="Candidate recipes with a reason for each, carried from draft to a manager's approval before anyone mixes."
        actions={<ProgrammePicker programmes={selection.programmes} value={selection.programmeId} onChange={selection.setProgrammeId} />}
      />
      {notice && (
        <Notice tone="success" className="mb-4">
          {notice}
        </Notice>
      )}
      <ProgrammeGate selection={selection} canCreate={can(user.role, 'programmes.write')}>
        {(programme) => (
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
        )}
      </ProgrammeGate>
    </>
  );
}
