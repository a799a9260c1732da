// Writes a small PNG for the demo history's photo: a drawn amber marker lens with a dark crack across it,
// on a grey trailer side. An illustration made by code, not a photograph. Usage: node make-demo-photo.mjs out.png
import { writeFileSync } from 'node:fs';
import { PNG } from 'pngjs';

const width = 240;
const height = 160;

function colourAt(x, y) {
  const cx = 120;
  const cy = 80;
  const inLens = ((x - cx) / 70) ** 2 + ((y - cy) / 32) ** 2 <= 1;
  const onRim = ((x - cx) / 76) ** 2 + ((y - cy) / 38) ** 2 <= 1 && !inLens;
  // A crack: a jagged dark line across the lens.
  const crackY = 40 + (x - 60) * 0.55 + (Math.floor(x / 9) % 2 === 0 ? 2 : -2);
  const onCrack = inLens && Math.abs(y - crackY) < 1.6;
  if (onCrack) return [40, 28, 10];
  if (inLens) return [235 - ((y - 48) >> 1), 150 - ((x - 50) >> 2), 20];
  if (onRim) return [55, 55, 60];
  const grain = (x * 7 + y * 13) % 11;
  return [150 + grain, 152 + grain, 158 + grain];
}

const image = new PNG({ width, height, colorType: 2 });
for (let y = 0; y < height; y += 1) {
  for (let x = 0; x < width; x += 1) {
    image.data.set([...colourAt(x, y), 255], (y * width + x) * 4);
  }
}
writeFileSync(
  process.argv[2] ?? 'photo.png',
  PNG.sync.write(image, { colorType: 2, filterType: 0, deflateStrategy: 0 }),
);
