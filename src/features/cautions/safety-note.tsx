/**
 * The cautions Gelwright shows wherever a recipe or a prediction is. Wording is ours;
 * it defers to the supplier's safety data sheet, local rules and the site's licensed practice.
 */
export function SafetyNote({ compact = false }: { compact?: boolean }) {
  return (
    <aside aria-label="Cautions" className="rounded-card border border-amber-500/40 bg-amber-50 px-4 py-3 text-sm text-amber-700">
      <p className="font-semibold">Before you mix</p>
      <ul className={`mt-1 list-disc pl-5 ${compact ? 'space-y-0.5' : 'space-y-1'}`}>
        <li>Predictions come from approximate theory and your team's calibration. They do not replace stability testing.</li>
        <li>Read the supplier's safety data sheet for every particle powder, polymer, salt and solvent before handling it.</li>
        <li>Dry nanoparticle powders can be inhaled: follow your site's rules for handling and disposal of nanomaterials.</li>
        {!compact && <li>Your site's licensed safety practice and local regulations take precedence over anything shown here.</li>}
      </ul>
    </aside>
  );
}
