import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { jsonLines, runJsonLines } from './run-json-lines.js';

const repoRoot = fileURLToPath(new URL('../../..', import.meta.url));

// Runs the command exactly as documented: npm run --silent evaluate --workspace shared.
const runEvaluate = (input: string) =>
  runJsonLines('npm', ['run', '--silent', 'evaluate', '--workspace', 'shared'], input, repoRoot);

describe('evaluate CLI', () => {
  it('answers each line in order and goes on after a bad line', async () => {
    const input = jsonLines([
      // 49 CFR 393.75(b): steer tread at least 4/32 in; 3.175 mm is exactly 4/32 in.
      { quantity: 'tread_depth', value: 3.175, unit: 'mm', context: { axle: 'steer' } },
      'not json',
      // 49 CFR 393.47(e): type 30 long stroke, 2-1/2 in.
      { quantity: 'pushrod_stroke', value: 2.6, unit: 'in', context: { chamber: 'type-30-long' } },
      { quantity: 'tread_depth', value: 3, unit: 'psi', context: { axle: 'steer' } },
      { quantity: 'tread_depth', value: 3, unit: 'in/32', context: {} },
      { quantity: 'spin_rate', value: 3, unit: 'in/32', context: {} },
      // CDL manual, section 5: brakes applied, combination, more than 4 psi/min is too much.
      {
        quantity: 'leak_rate',
        value: 4,
        unit: 'psi/min',
        context: { brakesApplied: true, vehicle: 'combination' },
        locale: 'es',
      },
    ]);
    const { code, lines } = await runEvaluate(input);
    expect(code).toBe(0);
    expect(lines).toHaveLength(7);
    expect(lines[0]).toEqual({
      verdict: 'near_limit',
      limit: 4,
      unit: 'in/32',
      source: '49 CFR 393.75(b)',
      say: 'Tread depth 4 thirty-seconds: passes, but close to the minimum of 4 thirty-seconds.',
    });
    expect(lines[1]).toEqual({ error: 'The line is not valid JSON.' });
    expect(lines[2]).toMatchObject({ verdict: 'out_of_limit', limit: 2.5, unit: 'in', source: '49 CFR 393.47(e)' });
    expect(lines[3]).toEqual({ error: 'psi is not a unit of tread depth; use in/32.' });
    expect(lines[4]).toEqual({ error: 'A tread depth needs "axle" in the context.' });
    expect(lines[5]).toMatchObject({ error: expect.stringMatching(/Unknown quantity "spin_rate"/) as unknown });
    expect(lines[6]).toMatchObject({
      verdict: 'near_limit',
      limit: 4,
      unit: 'psi/min',
      say: expect.stringMatching(/^Pérdida de aire/) as unknown,
    });
    expect(Object.keys(lines[0] as object)).toEqual(['verdict', 'limit', 'unit', 'source', 'say']);
  }, 30_000);
});
