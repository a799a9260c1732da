// Writes a small PNG for the demo history's photo: a drawn amber marker lens with a dark crack across it,
// on a grey trailer side. An illustration made by code, not a photograph. Usage: node make-demo-photo.mjs out.png
import { writeFileSync } from 'node:fs';
import { deflateSync } from 'node:zlib';

const width = 240;
const height = 160;

function crc32(bytes) {
  let crc = ~0;
  for (const byte of bytes) {
    crc ^= byte;
    for (let k = 0; k < 8; k += 1) crc = (crc >>> 1) ^ (0xedb88320 & -(crc & 1));
  }
  return ~crc >>> 0;
}

function chunk(type, data) {
  const length = Buffer.alloc(4);
  length.writeUInt32BE(data.length);
  const body = Buffer.concat([Buffer.from(type, 'ascii'), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(body));
  return Buffer.concat([length, body, crc]);
}

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

const raw = Buffer.alloc((width * 3 + 1) * height);
for (let y = 0; y < height; y += 1) {
  const row = y * (width * 3 + 1);
  raw[row] = 0;
  for (let x = 0; x < width; x += 1) {
    const [r, g, b] = colourAt(x, y);
    raw.set([r, g, b], row + 1 + x * 3);
  }
}
const header = Buffer.alloc(13);
header.writeUInt32BE(width, 0);
header.writeUInt32BE(height, 4);
header.set([8, 2, 0, 0, 0], 8);
const png = Buffer.concat([
  Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
  chunk('IHDR', header),
  chunk('IDAT', deflateSync(raw, { level: 9 })),
  chunk('IEND', Buffer.alloc(0)),
]);
writeFileSync(process.argv[2] ?? 'photo.png', png);
