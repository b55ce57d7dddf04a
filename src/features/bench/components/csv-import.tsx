import { useRef, useState } from 'react';
import { IMPORT_COLUMNS, IMPORT_MAX_ROWS, REQUIRED_IMPORT_COLUMNS } from '@shared/schemas/observations';
import { OBSERVATION_METHODS, OBSERVED_STATES } from '@shared/states';
import type { ImportReport } from '@shared/views/observation';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { ApiError } from '@/lib/api-client';
import { useCheckImport } from '../api/check-import';
import { newIdempotencyKey, useCommitImport } from '../api/commit-import';
import { CsvTemplateLink } from './csv-template-link';
import { ImportReportTable } from './import-report-table';

type Step =
  | { step: 'idle' }
  | { step: 'checked'; report: ImportReport }
  | { step: 'refused'; report: ImportReport; atCommit: boolean }
  | { step: 'imported'; report: ImportReport };

const rows = (n: number) => `${n} ${n === 1 ? 'row' : 'rows'}`;

/**
 * Choose a file → the server checks it (nothing written) → the report → "Import N rows".
 * The import is all rows or none; the key made when the file was chosen makes a second click,
 * or a retry, return the first import's answer instead of importing twice.
 */
export function CsvImport({ onImported }: { onImported?: (report: ImportReport) => void }) {
  const input = useRef<HTMLInputElement>(null);
  // The key of the file on screen: an answer about a file chosen before it is dropped.
  const current = useRef<string | null>(null);
  // Set between the click and the answer, before React re-renders the busy button.
  const sending = useRef(false);
  const [chosen, setChosen] = useState<{ file: File; key: string } | null>(null);
  const [state, setState] = useState<Step>({ step: 'idle' });
  const [problem, setProblem] = useState<string | null>(null);
  const check = useCheckImport();
  const commit = useCommitImport();

  const choose = async (file: File | undefined) => {
    setProblem(null);
    setState({ step: 'idle' });
    if (!file) {
      current.current = null;
      return setChosen(null);
    }
    const key = newIdempotencyKey();
    current.current = key;
    setChosen({ file, key });
    try {
      const { status, report } = await check.mutateAsync(file);
      if (current.current !== key) return;
      setState(status === 422 ? { step: 'refused', report, atCommit: false } : { step: 'checked', report });
    } catch (error) {
      if (current.current !== key) return;
      setProblem(error instanceof ApiError ? error.message : 'The file could not be checked. Try again.');
    }
  };

  const importNow = async () => {
    if (!chosen || sending.current) return;
    sending.current = true;
    setProblem(null);
    try {
      const { status, report } = await commit.mutateAsync({ file: chosen.file, idempotencyKey: chosen.key });
      if (status === 422) return setState({ step: 'refused', report, atCommit: true });
      setState({ step: 'imported', report });
      onImported?.(report);
    } catch (error) {
      setProblem(error instanceof ApiError ? `${error.message} Press Import again: the same file is never imported twice.` : 'The import did not finish. Press Import again: the same file is never imported twice.');
    } finally {
      sending.current = false;
    }
  };

  const startOver = () => {
    current.current = null;
    setChosen(null);
    setState({ step: 'idle' });
    setProblem(null);
    if (input.current) input.current.value = '';
  };

  return (
    <div className="flex flex-col gap-4">
      <div className="text-sm text-ink-soft">
        <p>
          One row per observation of a recipe, named by its code. Columns: {IMPORT_COLUMNS.map((c, i) => (
            <span key={c}>
              {i > 0 && ', '}
              <code className="text-xs text-ink">{c}</code>
            </span>
          ))}
          ; the first {REQUIRED_IMPORT_COLUMNS.length} are required, leave the others empty when not measured. Dates as 2026-03-14; states {OBSERVED_STATES.join(', ')}; methods {OBSERVATION_METHODS.join(', ')}. Up to {IMPORT_MAX_ROWS} rows.
        </p>
        <p className="mt-1">
          <CsvTemplateLink />
        </p>
      </div>
      <Field label="CSV file to import" hint={<span className="text-ink-soft">The file is checked first; nothing is written until you press Import.</span>}>
        {(props) => (
          <input
            {...props}
            ref={input}
            type="file"
            accept=".csv,text/csv"
            onChange={(event) => choose(event.target.files?.[0])}
            className="text-sm file:mr-3 file:rounded-md file:border file:border-line-strong file:bg-panel file:px-3 file:py-1.5 file:text-sm file:font-medium"
          />
        )}
      </Field>
      {check.isPending && (
        <p className="text-sm text-ink-soft" role="status">
          Checking {chosen?.file.name}…
        </p>
      )}
      {problem && <Notice tone="error">{problem}</Notice>}
      {state.step === 'refused' && (
        <>
          <Notice tone="error" title={`Nothing was imported: ${state.report.problems.length === 1 ? '1 problem' : `${state.report.problems.length} problems`} in ${chosen?.file.name ?? 'the file'}`}>
            {state.atCommit ? 'The data changed since the check. ' : ''}Fix the rows below in your file and choose it again. The import takes every row or none.
          </Notice>
          <ImportReportTable problems={state.report.problems} />
        </>
      )}
      {state.step === 'checked' && (
        <Notice tone="success" title={`All ${rows(state.report.rows)} of ${chosen?.file.name ?? 'the file'} are valid`}>
          <p>Nothing is written yet.</p>
          <Button className="mt-2" busy={commit.isPending} onClick={importNow}>
            Import {rows(state.report.rows)}
          </Button>
        </Notice>
      )}
      {state.step === 'imported' && (
        <Notice tone="success" title={state.report.replayed ? `This file was already imported: ${rows(state.report.imported)}, nothing added twice` : `Imported ${rows(state.report.imported)}`}>
          <p>They are in the bench log now.</p>
          <Button variant="secondary" size="sm" className="mt-2" onClick={startOver}>
            Import another file
          </Button>
        </Notice>
      )}
    </div>
  );
}
