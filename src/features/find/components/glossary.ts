/** Map words a new hire meets in a reason or a boundary's name, each said plainly. */
const TERMS: { term: string; match: RegExp; meaning: string }[] = [
  { term: 'Binodal', match: /binodal/i, meaning: 'the edge of the region where the sample can split into a dilute and a dense part.' },
  { term: 'Spinodal', match: /spinodal/i, meaning: 'inside it the split starts at once, everywhere in the sample, instead of from a few seeds.' },
  { term: 'Freezing and melting', match: /freezing|melting/i, meaning: 'between them a fluid and crystals coexist; above melting the whole sample can order into crystals.' },
  { term: 'Glass line', match: /glass/i, meaning: 'beyond it the particles are caged by their neighbours (or by their bonds) and can no longer rearrange.' },
  { term: 'Percolation', match: /percolat/i, meaning: 'beyond it clusters of stuck particles join up across the whole sample.' },
  { term: 'Coexistence', match: /coexist/i, meaning: 'two phases side by side in one sample, such as a fluid with crystals in it.' },
  { term: 'Polydispersity', match: /polydispers/i, meaning: 'how much the particle sizes vary; a wide spread stops crystals from forming.' },
];

export function termsIn(...texts: (string | null | undefined)[]) {
  const text = texts.filter(Boolean).join(' ');
  return TERMS.filter((t) => t.match.test(text));
}
