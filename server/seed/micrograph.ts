import { PNG } from 'pngjs';
import { seededRandom } from '../../shared/seeded-random';


/**
 * An invented bright-field-style micrograph for the demo: dark particles on a light field,
 * either scattered (a fluid) or grown into branched clusters (a gel). Not data.
 */
export function demoMicrograph(kind: 'gel' | 'fluid', seed: number, size = 256): Buffer {
  const random = seededRandom(seed);
  const png = new PNG({ width: size, height: size });
  const field = new Float32Array(size * size).fill(1);
  const radius = 3.2;
  const centres: [number, number][] = [];
  const count = kind === 'gel' ? 520 : 260;
  while (centres.length < count) {
    if (kind === 'gel' && centres.length > 12 && random() < 0.93) {
      // Stick the new particle to a random existing one: diffusion-limited clusters, roughly.
      const [x0, y0] = centres[Math.floor(random() * centres.length)];
      const angle = random() * Math.PI * 2;
      centres.push([x0 + Math.cos(angle) * radius * 2.05, y0 + Math.sin(angle) * radius * 2.05]);
    } else {
      centres.push([random() * size, random() * size]);
    }
  }
  for (const [cx, cy] of centres) {
    for (let y = Math.max(0, Math.floor(cy - 6)); y < Math.min(size, Math.ceil(cy + 6)); y++) {
      for (let x = Math.max(0, Math.floor(cx - 6)); x < Math.min(size, Math.ceil(cx + 6)); x++) {
        const d2 = (x - cx) ** 2 + (y - cy) ** 2;
        field[y * size + x] *= 1 - 0.7 * Math.exp(-d2 / (2 * (radius * 0.8) ** 2));
      }
    }
  }
  for (let i = 0; i < size * size; i++) {
    const grain = (random() - 0.5) * 0.06;
    const value = Math.max(0, Math.min(255, Math.round((0.86 * field[i] + 0.08 + grain) * 255)));
    png.data[i * 4] = value;
    png.data[i * 4 + 1] = value;
    png.data[i * 4 + 2] = Math.min(255, value + 6);
    png.data[i * 4 + 3] = 255;
  }
  return PNG.sync.write(png);
}
