/** About 6.6 px a character for the 12 px axis labels of IBM Plex Sans (measured on screen). */
const CHARACTER_WIDTH = 6.6;

/**
 * The longest form of an axis label that fits `room` px: the whole label, then without its
 * closing parenthesis, then the symbol alone (the part before " — ").
 */
export function fittingLabel(label: string, room: number): string {
  const forms = [label, label.replace(/ \([^)]*\)$/, ''), label.split(' — ')[0]];
  return forms.find((form) => form.length * CHARACTER_WIDTH <= room) ?? forms[forms.length - 1];
}
