import { useState } from 'react';
import { Link } from 'react-router-dom';
import { STATE_LABELS } from '@shared/states';
import type { PlanView } from '@shared/views/plan';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { TextArea } from '@/components/ui/inputs';
import { Notice } from '@/components/ui/notice';
import { StateBadge } from '@/components/ui/state-badge';
import { EmptyState } from '@/components/ui/states';
import { Table, Td, Th } from '@/components/ui/table';
import { ApiError } from '@/lib/api-client';
import { formatNumber } from '@/lib/format';
import { useSendExperiments } from '../api/send-experiments';
import { doseHeading, evidenceText } from '../lib/plan-words';

/**
 * The next experiments: why they were chosen, in words; each composition with its chance of the
 * target state; and "Send to the bench as draft recipes" with a note for whoever mixes them.
 */
export function ExperimentList({ plan, canSend }: { plan: PlanView; canSend: boolean }) {
  const { experiments } = plan.outcome;
  const send = useSendExperiments(plan.id);
  const [chosen, setChosen] = useState<Set<number>>(() => new Set(experiments.items.filter((e) => !e.recipe).map((e) => e.index)));
  const [note, setNote] = useState('');
  const [problem, setProblem] = useState<string | null>(null);
  const target = STATE_LABELS[plan.targetState].toLowerCase();
  const toggle = (index: number) => setChosen((previous) => {
    const next = new Set(previous);
    if (next.has(index)) next.delete(index);
    else next.add(index);
    return next;
  });
  const go = async () => {
    setProblem(null);
    try {
      await send.mutateAsync({ experiments: [...chosen].sort((a, b) => a - b), ...(note.trim() ? { note: note.trim() } : {}) });
      setChosen(new Set());
    } catch (error) {
      setProblem(error instanceof ApiError ? error.message : 'The experiments could not be sent. Try again.');
    }
  };
  return (
    <div className="flex flex-col gap-3">
      <div className="flex flex-col gap-1.5 text-sm" data-testid="experiment-summary">
        {experiments.summary.map((line, i) => (
          <p key={i} className={i === 0 ? 'text-ink-soft' : ''}>
            {line}
          </p>
        ))}
      </div>
      {experiments.items.length === 0 ? (
        <EmptyState title="No next experiments in these ranges">The boundary's uncertain band does not cross the ranges searched.</EmptyState>
      ) : (
        <Table caption={`Next experiments of plan ${plan.id}`}>
          <thead>
            <tr>
              {canSend && <Th className="w-10"><span className="sr-only">Choose</span></Th>}
              <Th>#</Th>
              <Th>φ</Th>
              <Th>{doseHeading(plan)}</Th>
              <Th>Chance of {target}</Th>
              <Th>Predicted now</Th>
              <Th>Nearest bench evidence</Th>
              <Th>Recipe</Th>
            </tr>
          </thead>
          <tbody>
            {experiments.items.map((e) => (
              <tr key={e.index} data-experiment={e.index}>
                {canSend && (
                  <Td>
                    <input type="checkbox" aria-label={`Choose experiment ${e.index + 1}`} disabled={e.recipe !== null} checked={chosen.has(e.index)} onChange={() => toggle(e.index)} className="h-4 w-4 accent-amber-500" />
                  </Td>
                )}
                <Td className="font-medium">{e.index + 1}</Td>
                <Td>{e.phi.toFixed(3)}</Td>
                <Td>{formatNumber(e.level, 3)}</Td>
                <Td>{Math.round(e.probability * 100)} %</Td>
                <Td>
                  <StateBadge state={e.derived.predictedState} />
                </Td>
                <Td className="text-ink-soft">{evidenceText(e.evidence)}</Td>
                <Td>{e.recipe ? <Link to={`/recipes/${e.recipe.code}`}>{e.recipe.code}</Link> : <span className="text-ink-faint">—</span>}</Td>
              </tr>
            ))}
          </tbody>
        </Table>
      )}
      <p className="text-xs text-ink-faint">Method: {experiments.method}</p>
      {canSend && experiments.items.length > 0 && (
        <div className="flex flex-col gap-3 rounded-card border border-line bg-paper p-4">
          <Field label="Note for the bench (optional)" hint="Goes on every recipe sent, above why it was proposed.">
            {(p) => <TextArea {...p} rows={2} maxLength={1000} value={note} onChange={(event) => setNote(event.target.value)} />}
          </Field>
          <div className="flex flex-wrap items-center gap-3">
            <Button variant="secondary" onClick={go} busy={send.isPending} disabled={chosen.size === 0}>
              Send to the bench as draft recipes
            </Button>
            <span className="text-sm text-ink-soft">{chosen.size} chosen.</span>
          </div>
          {problem && <Notice tone="error">{problem}</Notice>}
          {send.data && (
            <Notice tone="success" title={`${send.data.recipes.length} recipe${send.data.recipes.length === 1 ? '' : 's'} sent to the bench`}>
              {send.data.recipes.map((r, i) => (
                <span key={r.id}>
                  {i > 0 && ', '}
                  <Link to={`/recipes/${r.code}`}>{r.code}</Link>
                </span>
              ))}
              . A bench scientist records what each shows in the bench log.
            </Notice>
          )}
        </div>
      )}
    </div>
  );
}
