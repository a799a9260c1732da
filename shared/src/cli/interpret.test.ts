import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { jsonLines, runJsonLines } from './run-json-lines.js';

const CLI = fileURLToPath(new URL('./interpret.ts', import.meta.url));

const runCli = (input: string) => runJsonLines(process.execPath, ['--import', 'tsx', CLI], input);

describe('interpret CLI', () => {
  it('answers every line in order, reporting bad lines and going on', async () => {
    const input = jsonLines([
      { text: 'looks good', expect: { type: 'check' }, locale: 'en' },
      'not json',
      { text: 'for thirty seconds', expect: { type: 'measure', quantity: 'tread_depth' }, locale: 'en' },
      { text: 'tiene una fuga', expect: { type: 'check' }, locale: 'es' },
      { text: 'repeat that', expect: { type: 'check' }, locale: 'en' },
      { text: 'um', expect: { type: 'check' }, locale: 'en' },
      { text: 'x', expect: { type: 'measure', quantity: 'weight' }, locale: 'en' },
      { text: 'ciento cinco', expect: { type: 'measure', quantity: 'tire_pressure' }, locale: 'es' },
      { text: 'good', expect: { type: 'check' }, locale: 'fr' },
      { text: 'n/a', expect: { type: 'check' }, locale: 'en' },
    ]);
    const { lines, code, stderr } = await runCli(input);
    expect(stderr.trim()).toBe('');
    expect(code).toBe(0);
    expect(lines).toHaveLength(10);
    expect(lines[0]).toEqual({ kind: 'answer', answer: 'pass' });
    expect(lines[1]).toHaveProperty('error');
    expect(lines[2]).toEqual({ kind: 'answer', measurement: { quantity: 'tread_depth', value: 4, unit: 'in/32' } });
    expect(lines[3]).toEqual({ kind: 'answer', answer: 'defect', detail: 'tiene una fuga' });
    expect(lines[4]).toEqual({ kind: 'command', command: 'repeat' });
    expect(lines[5]).toMatchObject({ kind: 'unclear' });
    expect(lines[6]).toHaveProperty('error');
    expect(lines[7]).toEqual({ kind: 'answer', measurement: { quantity: 'tire_pressure', value: 105, unit: 'psi' } });
    expect(lines[8]).toHaveProperty('error');
    expect(lines[9]).toEqual({ kind: 'answer', answer: 'not_applicable' });
  }, 30_000);
});
