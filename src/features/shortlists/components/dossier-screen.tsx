import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { STATE_LABELS } from '@shared/states';
import type { ShortlistItemView, ShortlistView } from '@shared/views/shortlist';
import { Button } from '@/components/ui/button';
import { StateBadge } from '@/components/ui/state-badge';
import { ErrorState, Loading } from '@/components/ui/states';
import { SymbolText } from '@/components/ui/symbol-text';
import { formatDate, formatDateTime, formatNumber } from '@/lib/format';
import { useRecipeObservations } from '@/features/bench';
import { SafetyNote } from '@/features/cautions';
import { RecipesMap } from '@/features/map';
import { useProgramme } from '@/features/programmes';
import { useShortlist } from '../api/get-shortlist';
import { DossierShelfLife, DossierShelfLifeCell } from './dossier-shelf-life';

/**
 * A shortlist on paper: its map, each recipe with its parameters, prediction, margin and bench
 * evidence, the calibration in use, the approval history and the cautions. Printed (or saved
 * as PDF) with the browser's own print; the screen-only controls hide themselves. `brand` heads
 * the printed page (the app's wordmark).
 */
export function DossierScreen({ shortlistId, brand }: { shortlistId: number; brand: ReactNode }) {
  const shortlist = useShortlist(shortlistId);
  const programme = useProgramme(shortlist.data?.programmeId ?? null);
  if (shortlist.isPending) return <Loading label="Preparing the dossier…" />;
  if (shortlist.isError) return <div className="p-8"><ErrorState error={shortlist.error} retry={() => shortlist.refetch()} /></div>;
  const s = shortlist.data;
  const calibration = s.items.find((i) => i.recipe.derived.calibration)?.recipe.derived.calibration ?? null;
  return (
    <main className="dossier mx-auto max-w-4xl bg-panel px-10 py-8 text-ink print:max-w-none print:px-0 print:py-0">
      <div className="mb-6 flex items-center justify-between print:hidden">
        <Link to={`/shortlists/${s.id}`}>← Back to the shortlist</Link>
        <Button onClick={() => window.print()}>Print or save as PDF</Button>
      </div>
      <header className="mb-6 flex items-start justify-between gap-6 border-b border-line pb-4">
        <div>
          <p className="text-xs uppercase tracking-wide text-ink-soft">Shortlist dossier</p>
          <h1 className="mt-1">{s.title}</h1>
          <p className="mt-1 text-sm text-ink-soft">
            {programme.data ? `${programme.data.name} (${programme.data.codePrefix})` : `Programme ${s.programmeId}`} · target {STATE_LABELS[s.targetState].toLowerCase()} · status {s.status} · {s.items.length} recipe{s.items.length === 1 ? '' : 's'}
          </p>
          {s.purpose && <p className="mt-2 text-sm">{s.purpose}</p>}
        </div>
        <div className="text-right text-xs text-ink-soft">
          {brand}
          <p className="mt-1">Printed {formatDateTime(new Date().toISOString())}</p>
        </div>
      </header>

      <section className="dossier-block mb-6" aria-label="Map of the shortlisted recipes">
        <h2 className="mb-2 text-lg">Where the recipes sit</h2>
        <RecipesMap recipes={s.items.map((i) => i.recipe)} title={`shortlist “${s.title}”`} height={400} />
        <p className="mt-2 text-xs text-ink-soft">
          Predictions: {calibration ? `calibrated to the team's bench on ${formatDate(calibration.acceptedAt)}` : 'uncalibrated published theory'} · model {s.items[0]?.recipe.derived.modelVersion ?? '—'}. Lines are approximate.
        </p>
      </section>

      <section className="dossier-block mb-6" aria-label="Summary">
        <h2 className="mb-2 text-lg">Summary</h2>
        <table className="w-full border-collapse text-sm">
          <thead>
            <tr className="border-b border-line text-left text-xs uppercase tracking-wide text-ink-soft">
              <th className="py-1.5 pr-2">#</th>
              <th className="py-1.5 pr-2">Code</th>
              <th className="py-1.5 pr-2">Name</th>
              <th className="py-1.5 pr-2 text-right">φ</th>
              <th className="py-1.5 pr-2 text-right">B2*</th>
              <th className="py-1.5 pr-2">Predicted</th>
              <th className="py-1.5 pr-2 text-right">Margin</th>
              <th className="py-1.5">Shelf life on the bench</th>
            </tr>
          </thead>
          <tbody>
            {s.items.map((item) => (
              <tr key={item.recipeId} className="border-b border-line/60">
                <td className="py-1.5 pr-2">{item.position + 1}</td>
                <td className="py-1.5 pr-2 font-medium">{item.recipe.code}</td>
                <td className="py-1.5 pr-2">{item.recipe.name}</td>
                <td className="py-1.5 pr-2 text-right tabular-nums">{formatNumber(item.recipe.derived.phi, 3)}</td>
                <td className="py-1.5 pr-2 text-right tabular-nums">{formatNumber(item.recipe.derived.reducedB2, 3)}</td>
                <td className="py-1.5 pr-2">
                  <StateBadge state={item.recipe.derived.predictedState} />
                </td>
                <td className="py-1.5 pr-2 text-right tabular-nums">{formatNumber(item.recipe.derived.margin, 2)}</td>
                <td className="py-1.5">
                  <SummaryShelfLife recipeId={item.recipeId} />
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </section>

      {s.items.map((item) => (
        <DossierRecipe key={item.recipeId} item={item} />
      ))}

      <section className="dossier-block mb-6" aria-label="Approval history">
        <h2 className="mb-2 text-lg">Approval history</h2>
        <History shortlist={s} />
      </section>

      <section className="dossier-block" aria-label="Cautions">
        <SafetyNote />
      </section>
    </main>
  );
}

function DossierRecipe({ item }: { item: ShortlistItemView }) {
  const observations = useRecipeObservations(item.recipeId);
  const d = item.recipe.derived;
  return (
    <section className="dossier-block mb-6 rounded-card border border-line p-4" aria-label={`Recipe ${item.recipe.code}`}>
      <div className="flex items-baseline justify-between gap-3">
        <h3>
          {item.position + 1}. {item.recipe.code} · {item.recipe.name}
          {item.frozen && <span className="ml-2 text-xs font-normal text-ink-soft">version {item.recipe.version}, as submitted</span>}
        </h3>
        <StateBadge state={d.predictedState} prefix="Predicted" />
      </div>
      <p className="mt-1 text-sm"><span className="text-ink-soft">Why it is here:</span> {item.reason}</p>
      {item.changed && (
        <p className="mt-1 text-sm font-medium text-brick-700">
          The recipe has changed since (now version {item.changed.currentVersion}
          {item.changed.differences.length > 0 ? `: ${item.changed.differences.map((d) => d.label).join(', ')}` : ''}); this dossier prints the submitted version.
        </p>
      )}
      {d.reason && <p className="mt-1 text-sm">{d.reason}</p>}
      {d.nearestBoundary && (
        <p className="mt-1 text-sm text-ink-soft">
          Nearest boundary: {d.nearestBoundary.label}, margin {formatNumber(d.margin, 2)}.
        </p>
      )}
      <dl className="mt-2 grid grid-cols-4 gap-x-4 gap-y-1 text-xs">
        {[
          ['φ', d.phi],
          ['B2*', d.reducedB2],
          ['τ', d.stickiness],
          ['U/kT', d.contactEnergyKT],
          ['q', d.sizeRatio],
          ['φ_p^R', d.polymerReservoir],
          ['Pe_g', d.timescales.gravitationalPeclet],
          ['Settling (m/s)', d.timescales.settlingSpeedMs],
        ].map(([label, value]) => (
          <div key={label as string} className="flex justify-between gap-2 border-b border-line/50">
            <dt className="text-ink-soft"><SymbolText text={label as string} /></dt>
            <dd className="tabular-nums">{formatNumber(value as number | null, 3)}</dd>
          </div>
        ))}
      </dl>
      <DossierShelfLife checks={observations.data} />
      <p className="mt-3 text-xs font-semibold uppercase tracking-wide text-ink-soft">Bench evidence</p>
      {observations.isPending ? (
        <p className="text-sm">Loading…</p>
      ) : !observations.data || observations.data.length === 0 ? (
        <p className="text-sm text-ink-soft">Not mixed yet: no observations.</p>
      ) : (
        <ul className="text-sm">
          {observations.data.map((o) => (
            <li key={o.id}>
              Day {o.ageDays}: {STATE_LABELS[o.observedState]} by {o.method}
              {o.storageModulusPa !== null ? `, G′ ${o.storageModulusPa} Pa` : ''}
              {o.agrees === false ? ' — differs from the prediction' : ''}
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}

/** The summary's shelf-life cell; the recipe's checks come from the same query as its section below. */
function SummaryShelfLife({ recipeId }: { recipeId: number }) {
  const observations = useRecipeObservations(recipeId);
  return observations.isError ? <span className="text-ink-soft">could not load the checks</span> : <DossierShelfLifeCell checks={observations.data} />;
}

function History({ shortlist }: { shortlist: ShortlistView }) {
  if (shortlist.history.length === 0) return <p className="text-sm text-ink-soft">No moves yet.</p>;
  return (
    <ol className="text-sm">
      {shortlist.history.map((h, index) => (
        <li key={index}>
          {formatDateTime(h.at)} — {h.from ? `${h.from} → ` : ''}
          <strong>{h.to}</strong> by {h.actor?.name ?? 'someone'}
          {h.comment ? `: “${h.comment}”` : ''}
        </li>
      ))}
    </ol>
  );
}
