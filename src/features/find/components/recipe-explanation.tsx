import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { STATE_DESCRIPTIONS, STATE_LABELS } from '@shared/states';
import type { RecipeView } from '@shared/views/recipe';
import { Card } from '@/components/ui/page';
import { StateGlyph } from '@/components/ui/state-badge';
import { ErrorState, Loading } from '@/components/ui/states';
import { formatDate, formatNumber } from '@/lib/format';
import { useRecipe } from '@/features/recipes';
import { BenchSummary } from './bench-summary';
import { termsIn } from './glossary';
import { SymbolText } from '@/components/ui/symbol-text';

/** Within 5 % of the map's size from a boundary, a recipe is called close (the margin is in normalised map units). */
const CLOSE_MARGIN = 0.05;

/** Each derived number with what it means, for someone meeting colloid jargon for the first time. */
function numbers(recipe: RecipeView): { label: string; value: string; meaning: string }[] {
  const d = recipe.derived;
  const rows = [
    { label: 'Volume fraction φ', value: `${formatNumber(d.phi)} (${formatNumber(d.phi * 100, 3)} % of the volume)`, meaning: 'How crowded the particles are: the share of the sample they fill.' },
  ];
  if (d.contactEnergyKT !== null) rows.push({ label: 'Contact attraction U/kT', value: formatNumber(d.contactEnergyKT), meaning: 'How strongly two touching particles stick, in units of the thermal energy that shakes them apart.' });
  if (d.rangeSigma !== null) rows.push({ label: 'Attraction range', value: `${formatNumber(d.rangeSigma)} of a diameter`, meaning: 'How far the attraction reaches beyond contact.' });
  if (d.reducedB2 !== null) rows.push({ label: 'Reduced second virial coefficient B2*', value: formatNumber(d.reducedB2), meaning: 'Overall stickiness of a pair: 1 for plain hard spheres, lower when attraction wins, negative when it dominates.' });
  if (d.stickiness !== null) rows.push({ label: 'Stickiness τ', value: formatNumber(d.stickiness), meaning: 'The same stickiness on another scale: the smaller τ, the stickier.' });
  if (d.sizeRatio !== null) rows.push({ label: 'Size ratio q', value: formatNumber(d.sizeRatio), meaning: 'Polymer size over particle size: a small q means a short-range depletion attraction.' });
  return rows;
}

function Part({ title, children }: { title: string; children: ReactNode }) {
  return (
    <section className="flex flex-col gap-1.5">
      <h3 className="text-base">{title}</h3>
      {children}
    </section>
  );
}

/** Where one recipe sits on the state map, why, how close it is to changing state, and what the bench saw. */
export function RecipeExplanation({ code, programmeName, cautions }: { code: string; programmeName: (id: number) => string | null; cautions: ReactNode }) {
  const query = useRecipe(code);
  if (query.isPending) return <Loading label={`Loading ${code}…`} />;
  if (query.isError) return <ErrorState error={query.error} retry={() => query.refetch()} />;
  const recipe = query.data;
  const d = recipe.derived;
  const terms = termsIn(d.reason, d.nearestBoundary?.label);
  return (
    <article aria-labelledby="explained-recipe" className="flex flex-col gap-4">
      <Card>
        <div className="flex flex-col gap-5">
          <header>
            <h2 id="explained-recipe">
              {recipe.code} · {recipe.name}
            </h2>
            <p className="text-sm text-ink-soft">
              {programmeName(recipe.programmeId) ?? 'Programme'} · {recipe.fraction.kind === 'mass' ? 'mass' : 'volume'} fraction {formatNumber(recipe.fraction.value)} at {formatNumber(recipe.temperatureC)} °C
              {recipe.archived ? ' · archived' : ''}
            </p>
          </header>

          <Part title="What Gelwright predicts">
            {d.predictedState ? (
              <p className="flex items-baseline gap-2">
                <span className="self-center">
                  <StateGlyph state={d.predictedState} size={14} />
                </span>
                <span data-testid="predicted-state">
                  <span className="font-semibold">{STATE_LABELS[d.predictedState]}.</span> {STATE_DESCRIPTIONS[d.predictedState]}
                </span>
              </p>
            ) : (
              <p>No state was predicted for this recipe: its parameters fall outside what the model covers.</p>
            )}
            {d.reason && (
              <p data-testid="prediction-reason">
                <span className="font-medium">Why: </span>
                {d.reason}
              </p>
            )}
          </Part>

          <Part title="How close it is to another state">
            {d.nearestBoundary && d.margin !== null ? (
              <p data-testid="nearest-boundary">
                The nearest boundary on the map is <span className="font-medium">{d.nearestBoundary.label}</span>, {formatNumber(d.margin * 100, 2)} % of the map's size away.{' '}
                {d.margin < CLOSE_MARGIN
                  ? 'That is close: a small change in the recipe, or in how it is made, could put it in another state. Check it on the bench.'
                  : 'That is not close on this map, but the lines are approximate.'}
              </p>
            ) : (
              <p data-testid="nearest-boundary">The prediction names no boundary nearby on this map.</p>
            )}
            {d.marginDescription && (
              <p className="text-xs text-ink-soft" data-testid="margin-description">
                In map terms: <SymbolText text={d.marginDescription} />
              </p>
            )}
          </Part>

          <Part title="The numbers behind it">
            <dl className="grid gap-x-4 gap-y-2 text-sm md:grid-cols-[13rem_10rem_1fr]">
              {numbers(recipe).map((row) => (
                <div key={row.label} className="contents">
                  <dt className="font-medium">{row.label}</dt>
                  <dd className="tabular-nums">{row.value}</dd>
                  <dd className="text-ink-soft">{row.meaning}</dd>
                </div>
              ))}
            </dl>
            <p className="text-xs text-ink-soft">
              Computed with model {d.modelVersion}
              {d.map.theory ? ` (${d.map.theory})` : ''}
              {d.calibration ? `, with the programme's calibration accepted ${formatDate(d.calibration.acceptedAt)}` : ', without a calibration to the bench'}. The lines of the map are approximate.
            </p>
          </Part>

          {terms.length > 0 && (
            <Part title="Words used above">
              <dl className="text-sm">
                {terms.map((t) => (
                  <div key={t.term}>
                    <dt className="inline font-medium">{t.term}: </dt>
                    <dd className="inline">{t.meaning}</dd>
                  </div>
                ))}
              </dl>
            </Part>
          )}

          {d.warnings.length > 0 && (
            <Part title="Take note">
              <ul className="list-disc pl-5 text-sm">
                {d.warnings.map((w) => (
                  <li key={w}>{w}</li>
                ))}
              </ul>
            </Part>
          )}

          <Part title="What the bench saw">
            <BenchSummary recipeId={recipe.id} />
          </Part>

          <p>
            <Link to={`/recipes/${recipe.code}`} className="font-medium">
              Open the full recipe {recipe.code}
            </Link>
          </p>
        </div>
      </Card>
      {cautions}
    </article>
  );
}
