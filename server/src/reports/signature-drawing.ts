// A drawn signature as the client sends it: an SVG path ("M10 10 L40 20 ...") or a PNG data URL.
export type SignatureDrawing =
  | { kind: 'svg-path'; path: string; box: { minX: number; minY: number; width: number; height: number } }
  | { kind: 'png'; bytes: Buffer };

const PNG_PREFIX = 'data:image/png;base64,';
const PNG_SIGNATURE = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
// Only path commands and numbers: nothing else of SVG reaches the PDF.
const PATH_TEXT = /^[MmLlHhVvCcSsQqTtAaZz0-9eE.,+\-\s]+$/;
const PATH_MAX_CHARS = 200_000;

// Numbers each path command takes per repetition (SVG 1.1, 8.3 "Path data").
const ARITY: Record<string, number> = { m: 2, l: 2, h: 1, v: 1, c: 6, s: 4, q: 4, t: 2, a: 7, z: 0 };

function extent(values: number[]): [number, number] {
  let min = Infinity;
  let max = -Infinity;
  for (const value of values) {
    if (value < min) min = value;
    if (value > max) max = value;
  }
  return [min, max];
}

// The bounds of every point a path passes through or pulls towards (control points included, so
// the box holds the curve); null when the path cannot be read.
export function pathBounds(path: string): { minX: number; minY: number; width: number; height: number } | null {
  const tokens = path.match(/[A-Za-z]|[-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?/g);
  if (!tokens || !/^[Mm]$/.test(tokens[0] ?? '')) return null;
  let x = 0;
  let y = 0;
  let startX = 0;
  let startY = 0;
  const xs: number[] = [];
  const ys: number[] = [];
  let index = 0;
  while (index < tokens.length) {
    const command = tokens[index++] ?? '';
    const lower = command.toLowerCase();
    const arity = ARITY[lower];
    if (arity === undefined) return null;
    const relative = command === lower;
    if (arity === 0) {
      x = startX;
      y = startY;
      continue;
    }
    let first = true;
    while (index < tokens.length && !/^[A-Za-z]$/.test(tokens[index] ?? '')) {
      const args = tokens.slice(index, index + arity).map(Number);
      if (args.length < arity || args.some((n) => !Number.isFinite(n))) return null;
      index += arity;
      const baseX = relative ? x : 0;
      const baseY = relative ? y : 0;
      if (lower === 'h') {
        x = baseX + args[0]!;
      } else if (lower === 'v') {
        y = baseY + args[0]!;
      } else if (lower === 'a') {
        x = baseX + args[5]!;
        y = baseY + args[6]!;
      } else {
        for (let p = 0; p + 1 < arity - 2; p += 2) {
          xs.push(baseX + args[p]!);
          ys.push(baseY + args[p + 1]!);
        }
        x = baseX + args[arity - 2]!;
        y = baseY + args[arity - 1]!;
      }
      if (lower === 'm' && first) {
        startX = x;
        startY = y;
      }
      first = false;
      xs.push(x);
      ys.push(y);
    }
  }
  if (xs.length === 0) return null;
  // A loop, not Math.min(...xs): a long signature has more points than a call takes arguments.
  const [minX, maxX] = extent(xs);
  const [minY, maxY] = extent(ys);
  return { minX, minY, width: maxX - minX, height: maxY - minY };
}

// Null when the drawing is absent or not something we draw; the typed name always stands.
export function readSignatureDrawing(drawing: string | null | undefined): SignatureDrawing | null {
  if (!drawing) return null;
  const text = drawing.trim();
  if (text.startsWith(PNG_PREFIX)) {
    const bytes = Buffer.from(text.slice(PNG_PREFIX.length), 'base64');
    return bytes.subarray(0, PNG_SIGNATURE.length).equals(PNG_SIGNATURE) ? { kind: 'png', bytes } : null;
  }
  if (text.length > PATH_MAX_CHARS || !PATH_TEXT.test(text)) return null;
  const box = pathBounds(text);
  return box ? { kind: 'svg-path', path: text, box } : null;
}
