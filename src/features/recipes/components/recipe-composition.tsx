import type { RecipeView } from '@shared/views/recipe';
import { formatNumber } from '@/lib/format';
import { useLiveMaterials } from '@/features/library';

/** What the recipe is made of, in words, from its library entries. */
export function RecipeComposition({ recipe }: { recipe: RecipeView }) {
  const particles = useLiveMaterials('particles');
  const solvents = useLiveMaterials('solvents');
  const depletants = useLiveMaterials('depletants');
  const salts = useLiveMaterials('salts');
  const particle = particles.data?.find((m) => m.id === recipe.particleId);
  const solvent = solvents.data?.find((m) => m.id === recipe.solventId);
  const a = recipe.attraction;
  const attraction =
    a.source === 'depletion'
      ? `${depletants.data?.find((m) => m.id === a.depletantId)?.name ?? 'polymer'} at ${formatNumber(a.concentrationGL, 3)} g per litre of solvent`
      : a.source === 'salt'
        ? `${salts.data?.find((m) => m.id === a.saltId)?.name ?? 'salt'} at ${formatNumber(a.concentrationMM, 3)} mM`
        : a.source === 'direct'
          ? `a known attraction of ${formatNumber(a.contactEnergyKT, 3)} kT over ${formatNumber(a.rangeSigma, 3)} of a diameter`
          : 'no added attraction';
  return (
    <dl className="grid grid-cols-[9rem_1fr] gap-x-3 gap-y-1.5 text-sm">
      <dt className="text-ink-soft">Particles</dt>
      <dd>{particle ? `${particle.name} (radius ${particle.radiusNm} nm, ${particle.polydispersityPct} % polydisperse)` : '…'}</dd>
      <dt className="text-ink-soft">Amount</dt>
      <dd>{recipe.fraction.kind === 'volume' ? `volume fraction ${recipe.fraction.value}` : `mass fraction ${recipe.fraction.value}`}</dd>
      <dt className="text-ink-soft">Solvent</dt>
      <dd>{solvent?.name ?? '…'}</dd>
      <dt className="text-ink-soft">Attraction</dt>
      <dd>{attraction}</dd>
      <dt className="text-ink-soft">Temperature</dt>
      <dd>{recipe.temperatureC} °C</dd>
      {recipe.notes && (
        <>
          <dt className="text-ink-soft">Notes</dt>
          <dd className="whitespace-pre-wrap">{recipe.notes}</dd>
        </>
      )}
    </dl>
  );
}
