/**
 * Invented ageing of the demo's gel recipes: several samples per recipe, each filled to its own
 * height, checked at the usual ages, some collapsing (weak, dilute gels within days; strongly
 * attractive, crowded ones late or never within the watch; taller samples somewhat sooner), the
 * rest right-censored at their last check. Not data: a scenario shaped after the published
 * picture of delayed collapse (weak gels stand for a latency that grows with attraction strength
 * and falls with sample height, then collapse; Starrs, Poon, Hibberd & Robins, J. Phys.: Condens.
 * Matter 14, 2485 (2002), from memory), so the shelf-life panels have something to show.
 */

/** The ages at which the demo bench looks at a sample (roughly doubling; common practice). */
export const DEMO_CHECK_AGES = [1, 3, 7, 14, 28, 56] as const;

export interface DemoAgeingRecipe {
  phi: number;
  contactEnergyKT: number;
  /** This recipe's gels soften with age (its G′ falls); the others stiffen. */
  softens?: boolean;
}

export interface DemoCheck {
  ageDays: number;
  state: 'gel' | 'collapsed';
  storageModulusPa: number | null;
}

export interface DemoSample {
  /** Days before the seeding day on which the sample was mixed. */
  mixedDaysAgo: number;
  /** Fill height of the sample in its vial (mm); the seeder records it on the sample's first check. */
  sampleHeightMm: number;
  checks: DemoCheck[];
}

/**
 * An invented fill height for a demo sample: a whole number of millimetres from 20 to 80 (vials
 * filled anywhere from a quarter to most of the way).
 * @example demoSampleHeightMm(() => 0.5) // 50
 */
export function demoSampleHeightMm(random: () => number): number {
  return 20 + Math.round(60 * random());
}

/**
 * The invented scale (days) of a sample's time to collapse:
 * 12 d · exp(1.1 (U/kT − 6)) · (φ/0.1)^0.8 · (50 mm / H)^0.5, longer for stronger attraction and
 * more crowded gels, shorter for taller samples. A made-up law for the demo only.
 * @example demoCollapseScaleDays(0.1, 6, 50) // 12
 */
export function demoCollapseScaleDays(phi: number, contactEnergyKT: number, sampleHeightMm: number): number {
  return 12 * Math.exp(1.1 * (contactEnergyKT - 6)) * (phi / 0.1) ** 0.8 * Math.sqrt(50 / sampleHeightMm);
}

/**
 * G′ (Pa) of a demo gel at an age: G₀ (1 ± 0.3 log10 age), with G₀ = 5 + 900 φ^2.5 (U/kT / 6);
 * ageing gels commonly stiffen roughly with log age (common practice), one demo recipe softens.
 */
function demoModulusPa(recipe: DemoAgeingRecipe, ageDays: number, noise: number): number {
  const g0 = 5 + 900 * recipe.phi ** 2.5 * (recipe.contactEnergyKT / 6);
  const trend = (recipe.softens ? -0.3 : 0.3) * Math.log10(ageDays);
  return Math.round(g0 * (1 + trend) * (1 + 0.1 * (noise - 0.5)) * 10) / 10;
}

/**
 * One sample's checks: at each age of `ages` until the first at or after its latent time to
 * collapse, where it is seen collapsed (then nobody checks it again). `measureModulus` checks
 * carry G′ while the sample stands.
 */
function sampleChecks(recipe: DemoAgeingRecipe, collapseAt: number, ages: readonly number[], measureModulus: boolean, random: () => number): DemoCheck[] {
  const checks: DemoCheck[] = [];
  for (const ageDays of ages) {
    if (ageDays >= collapseAt) {
      checks.push({ ageDays, state: 'collapsed', storageModulusPa: null });
      break;
    }
    checks.push({ ageDays, state: 'gel', storageModulusPa: measureModulus ? demoModulusPa(recipe, ageDays, random()) : null });
  }
  return checks;
}

/**
 * Three samples of a gel recipe watched to 56 days (without a current sample, one in five stops
 * at 28: the jar was used up),
 * mixed 60–150 days before seeding; with `currentDaysAgo`, a fourth sample mixed that many days ago
 * (at least 3) whose latest scheduled check has not been made yet (so it is due on the bench log). Each
 * sample has its own fill height (demoSampleHeightMm); its latent time to collapse is Weibull with
 * shape 2 (a latency, then collapse) and the scale of its recipe and height.
 */
export function demoAgeingSamples(recipe: DemoAgeingRecipe, random: () => number, currentDaysAgo?: number): DemoSample[] {
  const collapseTime = (sampleHeightMm: number) => demoCollapseScaleDays(recipe.phi, recipe.contactEnergyKT, sampleHeightMm) * Math.sqrt(-Math.log(1 - random()));
  const samples: DemoSample[] = [];
  for (let i = 0; i < 3; i++) {
    // A scheduled recipe's old samples ran the whole schedule (else the cut-short ones would be due for ever).
    const cutShort = random() < 0.2 && currentDaysAgo === undefined;
    const ages = cutShort ? DEMO_CHECK_AGES.filter((age) => age <= 28) : DEMO_CHECK_AGES;
    const mixedDaysAgo = 60 + 30 * i + Math.floor(random() * 25);
    const sampleHeightMm = demoSampleHeightMm(random);
    samples.push({ mixedDaysAgo, sampleHeightMm, checks: sampleChecks(recipe, collapseTime(sampleHeightMm), ages, i < 2, random) });
  }
  if (currentDaysAgo !== undefined) {
    if (!(Number.isInteger(currentDaysAgo) && currentDaysAgo >= 3)) throw new RangeError(`demoAgeingSamples: currentDaysAgo ${currentDaysAgo} must be a whole number ≥ 3`);
    const reached = DEMO_CHECK_AGES.filter((age) => age <= currentDaysAgo);
    // Every check up to the one that has just come; that one is left for the bench to make.
    const sampleHeightMm = demoSampleHeightMm(random);
    samples.push({ mixedDaysAgo: currentDaysAgo, sampleHeightMm, checks: sampleChecks(recipe, collapseTime(sampleHeightMm), reached.slice(0, -1), true, random) });
  }
  return samples.filter((sample) => sample.checks.length > 0);
}
