import { useState } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import type { GoalState } from '@shared/states';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { TextInput } from '@/components/ui/inputs';
import { Notice } from '@/components/ui/notice';
import { StateBadge } from '@/components/ui/state-badge';
import { ApiError } from '@/lib/api-client';
import { useAddToShortlist } from '@/features/shortlists';
import type { MapPoint } from '../geometry/types';

/** What the brush selected, and the step from there to a shortlist. */
export function SelectionPanel({ points, programmeId, goalState, canShortlist, onClear }: { points: MapPoint[]; programmeId: number; goalState: GoalState; canShortlist: boolean; onClear: () => void }) {
  const add = useAddToShortlist();
  const navigate = useNavigate();
  const [title, setTitle] = useState('Picked on the map');
  const recipeIds = [...new Set(points.map((p) => p.recipeId).filter((id): id is number => id !== null))];
  if (points.length === 0) return <p className="text-sm text-ink-soft">Turn on “Select points” and drag a box over the map to pick recipes.</p>;
  return (
    <div className="flex flex-col gap-3 text-sm">
      <div className="flex items-center justify-between">
        <p className="font-medium">
          {points.length} point{points.length === 1 ? '' : 's'} selected · {recipeIds.length} recipe{recipeIds.length === 1 ? '' : 's'}
        </p>
        <Button variant="quiet" size="sm" onClick={onClear}>
          Clear
        </Button>
      </div>
      <ul className="max-h-56 divide-y divide-line overflow-y-auto rounded-md border border-line">
        {points.slice(0, 200).map((p) => (
          <li key={p.key} className="flex items-center justify-between gap-2 px-2 py-1.5">
            {p.code ? <Link to={`/recipes/${p.code}`}>{p.code}</Link> : <span>ad-hoc</span>}
            <StateBadge state={p.state} prefix={p.kind === 'recipe' ? 'predicted' : 'seen'} />
          </li>
        ))}
      </ul>
      {canShortlist && recipeIds.length > 0 && (
        <form
          className="flex flex-col gap-2"
          aria-label="Shortlist the selection"
          onSubmit={async (event) => {
            event.preventDefault();
            const shortlist = await add.mutateAsync({ programmeId, recipeIds, title, targetState: goalState }).catch(() => null);
            if (shortlist) navigate(`/shortlists/${shortlist.id}`);
          }}
        >
          <Field label="New shortlist title">{(props) => <TextInput {...props} value={title} onChange={(e) => setTitle(e.target.value)} />}</Field>
          <Button type="submit" busy={add.isPending}>
            Start a shortlist with {recipeIds.length} recipe{recipeIds.length === 1 ? '' : 's'}
          </Button>
          {add.isError && <Notice tone="error">{add.error instanceof ApiError ? add.error.message : 'The shortlist was not saved.'}</Notice>}
        </form>
      )}
    </div>
  );
}
