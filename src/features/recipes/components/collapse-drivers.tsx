import { STATE_LABELS, type PredictedState } from '@shared/states';
import type { ShelfLifeModel } from '@shared/shelf-life/shelf-life-model';
import { formatNumber } from '@/lib/format';

/**
 * What drives collapse across the programme: the Cox model's hazard ratios with their 95 %
 * intervals and readings, what it left out and why, this recipe's predicted median, or the
 * refusal in plain words; then the published physics of delayed collapse, as context only.
 */
export function CollapseDrivers({ model, prediction, predictedState, context }: { model: ShelfLifeModel; prediction: string | null; predictedState: PredictedState | null; context: string }) {
  return (
    <section aria-label="What drives collapse" className="flex flex-col gap-3 text-sm" data-testid="collapse-drivers">
      {model.status === 'refused' ? (
        <p data-testid="collapse-drivers-refused">
          <strong>{model.message}</strong> The curves above still hold; the model needs more of the bench.
        </p>
      ) : (
        <>
          <p className="text-ink-soft">
            Cox proportional-hazards fit over the programme's {model.sampleCount} samples ({model.eventCount} collapses); hazard ratio above 1: collapses sooner.
          </p>
          <table className="w-full text-left">
            <thead className="text-ink-soft">
              <tr>
                <th scope="col" className="py-1 pr-3 font-normal">Quantity</th>
                <th scope="col" className="py-1 pr-3 font-normal">Hazard ratio</th>
                <th scope="col" className="py-1 font-normal">95 % interval</th>
              </tr>
            </thead>
            <tbody>
              {model.terms.map((term) => (
                <tr key={term.key} className="border-t border-line">
                  <th scope="row" className="py-1 pr-3 font-normal">+{term.step}{term.unit ? ` ${term.unit}` : ''} of {term.label}</th>
                  <td className={`py-1 pr-3 tabular-nums ${term.clear ? 'font-semibold' : ''}`}>{formatNumber(term.hazardRatio, 3)}</td>
                  <td className="py-1 tabular-nums">{formatNumber(term.hazardRatioLow, 3)}–{formatNumber(term.hazardRatioHigh, 3)}</td>
                </tr>
              ))}
            </tbody>
          </table>
          <ul className="list-disc pl-5">
            {model.terms.map((term) => (
              <li key={term.key}>{term.reading.charAt(0).toUpperCase() + term.reading.slice(1)}.</li>
            ))}
          </ul>
          {prediction && (
            <p data-testid="collapse-prediction">
              <span className="text-ink-soft">For this recipe: </span>
              {prediction.charAt(0).toUpperCase() + prediction.slice(1)}.
              {predictedState !== null && predictedState !== 'gel' && (
                <span className="text-ink-soft"> It is predicted {STATE_LABELS[predictedState].toLowerCase()}, not a gel: this holds only for samples that do gel (the model learns from gel samples alone).</span>
              )}
            </p>
          )}
        </>
      )}
      {model.omitted.length > 0 && (
        <p className="text-ink-soft">Left out of the fit: {model.omitted.map((o) => `${o.label} (${o.why})`).join('; ')}.</p>
      )}
      <p className="text-xs text-ink-soft">{context} The fit assumes each quantity scales the hazard by the same factor at every age; that is not checked.</p>
    </section>
  );
}
