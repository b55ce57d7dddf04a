import { useState } from 'react';
import { Link } from 'react-router-dom';
import type { PlanView } from '@shared/views/plan';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { SelectInput, TextInput } from '@/components/ui/inputs';
import { Notice } from '@/components/ui/notice';
import { ApiError } from '@/lib/api-client';
import { useShortlists } from '@/features/shortlists';
import { useMakePlanRecipes } from '../api/make-plan-recipes';

type Mode = 'new' | 'existing' | 'none';

/**
 * "Make recipes and shortlist": the chosen candidates become recipes (the plan recorded as their
 * origin) and go onto a new draft shortlist, an existing draft one, or nowhere — in one request.
 */
export function MakeRecipesPanel({ plan, chosen, onDone }: { plan: PlanView; chosen: number[]; onDone: () => void }) {
  const make = useMakePlanRecipes(plan.id);
  const drafts = useShortlists({ programme: plan.programmeId, status: 'draft' });
  const [mode, setMode] = useState<Mode>('new');
  const [title, setTitle] = useState(`Planned: ${plan.title}`.slice(0, 120));
  const [shortlistId, setShortlistId] = useState<number | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const existing = shortlistId ?? drafts.data?.items[0]?.id ?? null;
  const go = async () => {
    setProblem(null);
    try {
      await make.mutateAsync({
        candidates: chosen,
        ...(mode === 'new' ? { shortlist: { mode: 'new' as const, title: title.trim() } } : mode === 'existing' && existing ? { shortlist: { mode: 'existing' as const, shortlistId: existing } } : {}),
      });
      onDone();
    } catch (error) {
      setProblem(error instanceof ApiError ? error.message : 'The recipes could not be made. Try again.');
    }
  };
  const done = make.data;
  return (
    <div className="flex flex-col gap-3 rounded-card border border-line bg-paper p-4" aria-label="Make recipes from the chosen candidates" role="group">
      <div role="radiogroup" aria-label="Shortlist for the new recipes" className="flex flex-wrap gap-2">
        {(
          [
            ['new', 'New draft shortlist'],
            ['existing', 'Add to a draft shortlist'],
            ['none', 'Recipes only'],
          ] as const
        ).map(([value, label]) => (
          <label key={value} className={`cursor-pointer rounded-md border px-3 py-1.5 text-sm ${mode === value ? 'border-fjord-500 bg-fjord-50 font-medium' : 'border-line-strong bg-panel'}`}>
            <input type="radio" className="sr-only" name={`plan-${plan.id}-shortlist`} value={value} checked={mode === value} onChange={() => setMode(value)} disabled={value === 'existing' && !drafts.data?.items.length} />
            {label}
          </label>
        ))}
      </div>
      {mode === 'new' && (
        <Field label="Shortlist title">
          {(p) => <TextInput {...p} value={title} maxLength={120} onChange={(event) => setTitle(event.target.value)} />}
        </Field>
      )}
      {mode === 'existing' && (
        <Field label="Draft shortlist">
          {(p) => (
            <SelectInput {...p} value={existing ?? ''} onChange={(event) => setShortlistId(Number(event.target.value))}>
              {(drafts.data?.items ?? []).map((s) => (
                <option key={s.id} value={s.id}>
                  {s.title}
                </option>
              ))}
            </SelectInput>
          )}
        </Field>
      )}
      <div className="flex flex-wrap items-center gap-3">
        <Button onClick={go} busy={make.isPending} disabled={chosen.length === 0 || (mode === 'new' && title.trim() === '')}>
          {mode === 'none' ? 'Make recipes' : 'Make recipes and shortlist'}
        </Button>
        <span className="text-sm text-ink-soft">{chosen.length === 0 ? 'Choose candidates in the list first.' : `${chosen.length} chosen.`}</span>
      </div>
      {problem && <Notice tone="error">{problem}</Notice>}
      {done && (
        <Notice tone="success" title={`${done.recipes.length} recipe${done.recipes.length === 1 ? '' : 's'} made`}>
          {done.recipes.map((r, i) => (
            <span key={r.id}>
              {i > 0 && ', '}
              <Link to={`/recipes/${r.code}`}>{r.code}</Link>
            </span>
          ))}
          {done.shortlist && (
            <>
              {' '}on the draft shortlist <Link to={`/shortlists/${done.shortlist.id}`}>{done.shortlist.title}</Link>.
            </>
          )}
        </Notice>
      )}
    </div>
  );
}
