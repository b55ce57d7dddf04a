import { STATE_LABELS } from '@shared/states';
import type { ObservationView } from '@shared/views/observation';
import { StateGlyph } from '@/components/ui/state-badge';
import { EmptyState } from '@/components/ui/states';
import { formatDate } from '@/lib/format';

/** The usual inspection ages of a shelf test, in days; observations are grouped onto them. */
const MILESTONES = [0, 1, 7, 30, 90, 180, 365];

function milestoneOf(ageDays: number) {
  return MILESTONES.reduce((best, m) => (Math.abs(m - ageDays) < Math.abs(best - ageDays) ? m : best), MILESTONES[0]);
}

function ageLabel(days: number) {
  if (days === 0) return 'Day 0';
  if (days < 30) return `Day ${days}`;
  if (days < 365) return `${Math.round(days / 30)} mo`;
  return `${Math.round(days / 365)} yr`;
}

/**
 * A recipe's observations laid out by age, so a gel that coarsened and later collapsed shows
 * at a glance. Each column is an inspection age; each entry says the state in words.
 */
export function ObservationTimeline({ observations }: { observations: ObservationView[] }) {
  if (observations.length === 0) return <EmptyState title="No bench outcomes yet">Record one in the bench log once the sample is mixed.</EmptyState>;
  const columns = new Map<number, ObservationView[]>();
  for (const o of observations) {
    const m = milestoneOf(o.ageDays);
    columns.set(m, [...(columns.get(m) ?? []), o]);
  }
  const ages = [...columns.keys()].sort((a, b) => a - b);
  return (
    <ol className="flex gap-0 overflow-x-auto pb-2" aria-label="Observations by age">
      {ages.map((age, index) => (
        <li key={age} className="relative min-w-36 flex-1">
          <div className="flex items-center">
            <span className="z-10 h-3 w-3 rounded-full border-2 border-fjord-500 bg-panel" aria-hidden />
            {index < ages.length - 1 && <span className="h-0.5 flex-1 bg-fjord-100" aria-hidden />}
          </div>
          <p className="mt-1 text-xs font-semibold uppercase tracking-wide text-ink-soft">{ageLabel(age)}</p>
          <ul className="mt-2 flex flex-col gap-1.5 pr-3">
            {columns.get(age)!.map((o) => (
              <li key={o.id} className="rounded-md border border-line bg-panel px-2 py-1.5 text-sm" title={o.notes ?? undefined}>
                <span className="flex items-center gap-1.5 font-medium">
                  <StateGlyph state={o.observedState} />
                  {STATE_LABELS[o.observedState]}
                  {o.agrees === false && (
                    <span className="ml-auto text-xs font-semibold text-brick-700" title="Differs from the prediction">
                      ≠ predicted
                    </span>
                  )}
                </span>
                <span className="block text-xs text-ink-soft">
                  day {o.ageDays} · {o.method}
                  {o.storageModulusPa !== null ? ` · G′ ${o.storageModulusPa} Pa` : ''}
                  {o.settledHeightPct !== null ? ` · settled to ${o.settledHeightPct} %` : ''}
                </span>
                <span className="block text-xs text-ink-faint">mixed {formatDate(o.mixedAt)}</span>
              </li>
            ))}
          </ul>
        </li>
      ))}
    </ol>
  );
}
