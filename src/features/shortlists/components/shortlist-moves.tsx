import { useId, useState } from 'react';
import { shortlistDecisionSchema, shortlistReturnSchema } from '@shared/schemas/shortlists';
import type { ShortlistView } from '@shared/views/shortlist';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { TextArea } from '@/components/ui/inputs';
import { Notice } from '@/components/ui/notice';
import { ApiError } from '@/lib/api-client';
import { useApproveShortlist } from '../api/approve-shortlist';
import { useArchiveShortlist } from '../api/archive-shortlist';
import { useReopenShortlist } from '../api/reopen-shortlist';
import { useReturnShortlist } from '../api/return-shortlist';
import { useSubmitShortlist } from '../api/submit-shortlist';
import type { AllowedMoves } from '@shared/shortlist-moves';

const messageOf = (error: unknown) => (error instanceof ApiError ? error.message : 'The change was not saved. Try again.');

/** The controls this person may use on this shortlist, and nothing else (see allowedMoves). */
export function ShortlistMoves({ shortlist, moves, onEdit, onArchived }: { shortlist: ShortlistView; moves: AllowedMoves; onEdit: () => void; onArchived: () => void }) {
  const submit = useSubmitShortlist(shortlist.id);
  const reopen = useReopenShortlist(shortlist.id);
  const archive = useArchiveShortlist(shortlist.id);
  const [confirmArchive, setConfirmArchive] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const run = async (action: () => Promise<unknown>) => {
    setProblem(null);
    try {
      await action();
    } catch (error) {
      setProblem(messageOf(error));
    }
  };
  return (
    <div className="flex flex-col gap-3">
      {problem && <Notice tone="error">{problem}</Notice>}
      {(moves.edit || moves.submit || moves.reopen || moves.archive) && (
        <div className="flex flex-wrap items-center gap-2">
          {moves.submit && (
            <Button busy={submit.isPending} onClick={() => run(() => submit.mutateAsync())}>
              Submit for review
            </Button>
          )}
          {moves.edit && (
            <Button variant="secondary" onClick={onEdit}>
              Edit the draft
            </Button>
          )}
          {moves.reopen && (
            <Button busy={reopen.isPending} onClick={() => run(() => reopen.mutateAsync())}>
              Reopen as a draft
            </Button>
          )}
          {moves.archive && !confirmArchive && (
            <Button variant="quiet" onClick={() => setConfirmArchive(true)}>
              Archive…
            </Button>
          )}
          {moves.archive && confirmArchive && (
            <span className="inline-flex items-center gap-2 rounded-md border border-brick-500/40 bg-brick-50 px-3 py-1 text-sm text-brick-700">
              Archive this shortlist? It leaves the lists and stays on record.
              <Button variant="danger" size="sm" busy={archive.isPending} onClick={() =>
                  run(async () => {
                    await archive.mutateAsync();
                    onArchived();
                  })
                }>
                Archive it
              </Button>
              <Button variant="secondary" size="sm" onClick={() => setConfirmArchive(false)}>
                Keep it
              </Button>
            </span>
          )}
          {moves.submit && <span className="text-xs text-ink-soft">Submitting e-mails the programme managers.</span>}
        </div>
      )}
      {(moves.approve || moves.return) && <DecisionPanel shortlist={shortlist} moves={moves} />}
    </div>
  );
}

/** Approve (comment optional) or return (comment required) a submitted shortlist. */
function DecisionPanel({ shortlist, moves }: { shortlist: ShortlistView; moves: AllowedMoves }) {
  const approve = useApproveShortlist(shortlist.id);
  const giveBack = useReturnShortlist(shortlist.id);
  const [comment, setComment] = useState('');
  const [fieldError, setFieldError] = useState<string | undefined>();
  const [problem, setProblem] = useState<string | null>(null);
  const headingId = useId();
  const decide = async (decision: 'approve' | 'return') => {
    setProblem(null);
    const parsed = (decision === 'approve' ? shortlistDecisionSchema : shortlistReturnSchema).safeParse({ comment });
    if (!parsed.success) return setFieldError(decision === 'return' ? 'Say what the author should change: returning needs a comment' : parsed.error.issues[0].message);
    setFieldError(undefined);
    try {
      if (decision === 'approve') await approve.mutateAsync(parsed.data);
      else await giveBack.mutateAsync({ comment: parsed.data.comment ?? '' });
    } catch (error) {
      setProblem(messageOf(error));
    }
  };
  return (
    <section aria-labelledby={headingId} className="rounded-card border border-amber-500/40 bg-amber-50/60 p-4">
      <h2 id={headingId} className="text-base">
        Your decision
      </h2>
      <p className="mb-3 text-sm text-ink-soft">
        {shortlist.author?.name ?? 'The author'} is e-mailed either way. An approved shortlist is frozen; a returned one goes back to its author.
      </p>
      {problem && (
        <Notice tone="error" className="mb-3">
          {problem}
        </Notice>
      )}
      <Field label="Comment for the author" hint={<span className="text-ink-soft">{moves.return ? 'Needed to return the shortlist; optional when approving' : 'Optional'}</span>} error={fieldError}>
        {(props) => <TextArea {...props} value={comment} onChange={(event) => setComment(event.target.value)} />}
      </Field>
      <div className="mt-3 flex flex-wrap gap-2">
        {moves.approve && (
          <Button busy={approve.isPending} disabled={giveBack.isPending} onClick={() => decide('approve')}>
            Approve
          </Button>
        )}
        {moves.return && (
          <Button variant="secondary" busy={giveBack.isPending} disabled={approve.isPending} onClick={() => decide('return')}>
            Return to the author
          </Button>
        )}
      </div>
    </section>
  );
}
