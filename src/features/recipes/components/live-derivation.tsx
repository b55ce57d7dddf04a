import { useMemo, type ReactNode } from 'react';
import type { StateMap } from '@shared/physics/map/types';
import { PhysicsArgumentError } from '@shared/physics/validation/physics-argument-error';
import { pickRecipeMaterials } from '@shared/pick-recipe-materials';
import { deriveRecipe, type RecipeMaterials } from '@shared/recipe-derivation';
import { recipeInputSchema, type RecipeInput } from '@shared/schemas/recipes';
import type { RecipeDerived } from '@shared/views/recipe';
import { Notice } from '@/components/ui/notice';
import { useLiveMaterials } from '@/features/library';
import { DerivedPanel } from './derived-panel';

type Outcome = { ok: true; derived: RecipeDerived; map: StateMap } | { ok: false; message: string };

/**
 * The prediction of the recipe being typed, computed in the browser with shared/physics (the
 * server computes it again on save and stores its own result).
 */
export function LiveDerivation({ values, renderMap }: { values: RecipeInput; renderMap: (map: StateMap, derived: RecipeDerived) => ReactNode }) {
  const particles = useLiveMaterials('particles');
  const solvents = useLiveMaterials('solvents');
  const depletants = useLiveMaterials('depletants');
  const salts = useLiveMaterials('salts');
  const key = JSON.stringify(values);
  const outcome = useMemo((): Outcome => {
    // The name does not change the physics: predict before it is typed.
    const parsed = recipeInputSchema.safeParse({ ...values, name: values.name || 'preview' });
    if (!parsed.success) return { ok: false, message: `Complete the form to see the prediction: ${parsed.error.issues[0].path.join('.')} — ${parsed.error.issues[0].message}` };
    const input = parsed.data;
    const byId = <M extends { id: number }>(rows: M[] | undefined) => (id: number) => rows?.find((m) => m.id === id);
    const picked = pickRecipeMaterials(input, { particle: byId(particles.data), solvent: byId(solvents.data), depletant: byId(depletants.data), salt: byId(salts.data) });
    const materials: RecipeMaterials | null = 'missing' in picked ? null : picked;
    if (!materials) return { ok: false, message: 'Loading the library…' };
    try {
      const { derived, map } = deriveRecipe(input, materials);
      return { ok: true, derived, map };
    } catch (error) {
      return { ok: false, message: error instanceof PhysicsArgumentError ? error.message : 'The prediction could not be computed for these values.' };
    }
  }, [key, particles.data, solvents.data, depletants.data, salts.data]);
  if (!outcome.ok) return <Notice tone="info">{outcome.message}</Notice>;
  return (
    <div className="flex flex-col gap-4 rounded-card border border-line bg-panel p-4" data-testid="live-derivation">
      <p className="text-xs font-semibold uppercase tracking-wide text-ink-soft">Live prediction (confirmed by the server on save)</p>
      {renderMap(outcome.map, outcome.derived)}
      <DerivedPanel derived={outcome.derived} title="Live derived parameters" />
    </div>
  );
}
