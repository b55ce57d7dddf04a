import type { GroupShelfLife, RegionShelfLife } from '@shared/shelf-life/programme-shelf-life';
import { SurvivalCurveChart } from './survival-curve';

const sentence = (words: string) => `${words.charAt(0).toUpperCase()}${words.slice(1)}.`;

/**
 * How long gels like this recipe lasted: the Kaplan–Meier curve of its group of similar recipes
 * (same materials, near on the map) and of its map region (every recipe predicted in the same
 * state), each with its band and median in words, and the rule that made the group and region.
 */
export function SimilarSurvival({ group, region, rules }: { group: GroupShelfLife | null; region: RegionShelfLife | null; rules: { group: string; region: string } }) {
  const sampled = group?.sampledRecipeIds.length ?? 0;
  return (
    <div className="flex flex-col gap-4" data-testid="similar-survival">
      <section aria-label="Similar recipes">
        <h3 className="text-sm font-semibold">Similar recipes</h3>
        {group && group.curve.sampleCount > 0 ? (
          <>
            <p className="text-sm">
              <span className="text-ink-soft">{group.recipeIds.length} recipe{group.recipeIds.length === 1 ? '' : 's'} in the group, {sampled} with samples: </span>
              <strong>{sentence(group.summary)}</strong>
            </p>
            <SurvivalCurveChart curve={group.curve} label={`Share of the similar recipes' gel samples still standing against age: ${group.summary}`} />
          </>
        ) : (
          <p className="text-sm text-ink-soft">No similar recipe has bench samples yet.</p>
        )}
      </section>
      <section aria-label="Map region">
        <h3 className="text-sm font-semibold">{region ? `The ${region.label}` : 'Its map region'}</h3>
        {region ? (
          <>
            <p className="text-sm">
              <span className="text-ink-soft">{region.sampledRecipeCount} recipe{region.sampledRecipeCount === 1 ? '' : 's'} with samples: </span>
              <strong>{sentence(region.summary)}</strong>
            </p>
            <SurvivalCurveChart curve={region.curve} label={`Share of gel samples in the ${region.label} still standing against age: ${region.summary}`} />
          </>
        ) : (
          <p className="text-sm text-ink-soft">No recipe in this region has bench samples yet.</p>
        )}
      </section>
      <p className="text-xs text-ink-soft">
        {rules.group} {rules.region}
      </p>
    </div>
  );
}
