import type { AgreementTable } from '@shared/calibration/types';
import { observationAgrees, STATE_LABELS, type ObservedState, type PredictedState } from '@shared/states';

/** Predicted (rows) × observed (columns) counts; the cells where prediction and bench agree are shaded. */
export function AgreementGrid({ table, caption }: { table: AgreementTable; caption: string }) {
  const agrees = (predicted: string, observed: string) => observationAgrees(observed as ObservedState, predicted as PredictedState) === true;
  return (
    <div className="overflow-x-auto">
      <table className="w-full border-collapse text-sm">
        <caption className="mb-1 text-left text-sm font-semibold text-ink">{caption}</caption>
        <thead>
          <tr>
            <th scope="col" className="px-2 py-1 text-left text-xs font-medium text-ink-soft">
              Predicted ↓ / observed →
            </th>
            {table.observed.map((state) => (
              <th key={state} scope="col" className="px-2 py-1 text-right text-xs font-medium text-ink-soft">
                {STATE_LABELS[state]}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {table.predicted.map((predicted, i) => (
            <tr key={predicted} className="border-t border-line/70">
              <th scope="row" className="px-2 py-1 text-left font-medium text-ink">
                {STATE_LABELS[predicted]}
              </th>
              {table.observed.map((observed, j) => {
                const count = table.counts[i][j];
                return (
                  <td key={observed} className={`px-2 py-1 text-right tabular-nums ${agrees(predicted, observed) ? 'bg-leaf-50 font-semibold text-leaf-700' : count > 0 ? 'text-brick-700' : 'text-ink-faint'}`}>
                    {count}
                  </td>
                );
              })}
            </tr>
          ))}
        </tbody>
      </table>
      <p className="mt-1 text-xs text-ink-soft">
        Gel side called right: {table.gelSide.truePositive + table.gelSide.trueNegative} of {table.counts.flat().reduce((s, n) => s + n, 0)} ({Math.round(table.accuracy * 100)} %); same state as observed: {Math.round(table.sameState * 100)} %.
      </p>
    </div>
  );
}
