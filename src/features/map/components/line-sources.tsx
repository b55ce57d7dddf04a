/**
 * Plain words on where every line of a state map comes from and how far to trust it. With a
 * map's own notes it lists those too (the recipe page); without, it is the general guide (Library).
 */
const LINES: Array<{ name: string; words: string }> = [
  {
    name: 'Fluid–fluid binodal and spinodal',
    words: 'Where a suspension splits into a dilute and a dense fluid. Short-range attraction is placed by its B2* (extended law of corresponding states, Noro & Frenkel 2000) on a mean-field Carnahan–Starling fluid or on Baxter sticky spheres; long-range depletion (q > 0.25) uses free-volume theory for colloids with polymer (Lekkerkerker et al. 1992). Approximate: good to a few tenths in B2*.',
  },
  {
    name: 'Gel',
    words: 'Inside the spinodal and below the glass line the separation arrests into a space-spanning gel (Lu et al., Nature 2008). Inside the binodal, above the spinodal, a sample gels when B2* is at or below the gel threshold: by default the critical B2* ≈ −1.5, because Lu et al. saw every quench into the two-phase region gel; a calibration can move it.',
  },
  {
    name: 'Freezing and melting',
    words: 'Fluid–crystal coexistence from the same free energies with a cell-model crystal. Above about 12 % size polydispersity crystals are taken as suppressed and the region is greyed.',
  },
  {
    name: 'Glass lines',
    words: 'Idealised mode-coupling theory (Götze; Franosch et al. 1997) with Percus–Yevick structure factors of sticky spheres, computed on 100 wave numbers up to k_max σ = 40. Weak stickiness melts the crowded glass (the line bulges to higher φ), strong stickiness arrests at lower φ into an attractive glass (Bergenholtz & Fuchs 1999; Dawson et al. 2000; Pham et al. 2002). MCT puts hard spheres at φ = 0.516, below the observed 0.58: the map rescales the line onto 0.58 unless you choose the computed line. The attractive branch depends on the cut-off and is drawn as approximate.',
  },
  {
    name: 'Percolation',
    words: 'Where bonds of sticky spheres first span the sample (Chiew & Glandt 1983). It does not change the predicted state; it marks where a gel can hold itself up.',
  },
];

export function LineSources({ notes, title = 'Where the lines come from' }: { notes?: string[]; title?: string }) {
  return (
    <details className="text-sm" data-testid="line-sources">
      <summary className="cursor-pointer font-medium text-fjord-700">{title}</summary>
      {notes ? (
        <ul className="mt-2 list-disc space-y-1 pl-5 text-ink-soft">
          {notes.map((note) => (
            <li key={note}>{note}</li>
          ))}
        </ul>
      ) : (
        <dl className="mt-2 space-y-2">
          {LINES.map((line) => (
            <div key={line.name}>
              <dt className="font-medium text-ink">{line.name}</dt>
              <dd className="text-ink-soft">{line.words}</dd>
            </div>
          ))}
        </dl>
      )}
      <p className="mt-2 text-xs text-ink-soft">Every line is approximate theory: it guides experiments and does not replace stability testing.</p>
    </details>
  );
}
