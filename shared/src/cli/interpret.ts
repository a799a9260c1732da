// Reads JSON lines {text, expect, locale} on stdin and writes one interpretation per line, in order.
import { createInterface } from 'node:readline';
import { isQuantity } from '../units/index.js';
import { LOCALES, type Expectation, type Locale } from '../checklist/index.js';
import { interpretUtterance, loadAnswerWords, type Interpretation } from '../interpreter/index.js';

type Output = Record<string, unknown>;

function parseLine(line: string): { text: string; expect: Expectation; locale: Locale } | { error: string } {
  let raw: unknown;
  try {
    raw = JSON.parse(line);
  } catch {
    return {
      error: 'Not JSON: each line must be an object like {"text": "good", "expect": {"type": "check"}, "locale": "en"}',
    };
  }
  if (typeof raw !== 'object' || raw === null) return { error: 'Each line must be a JSON object' };
  const { text, expect, locale } = raw as Record<string, unknown>;
  if (typeof text !== 'string') return { error: '"text" must be a string' };
  if (typeof locale !== 'string' || !(LOCALES as readonly string[]).includes(locale)) {
    return { error: `"locale" must be one of ${LOCALES.join(', ')}` };
  }
  if (typeof expect !== 'object' || expect === null)
    return { error: '"expect" must be {"type": "check"} or {"type": "measure", "quantity": ...}' };
  const { type, quantity } = expect as Record<string, unknown>;
  if (type === 'check') return { text, expect: { type: 'check' }, locale: locale as Locale };
  if (type === 'measure') {
    if (!isQuantity(quantity))
      return { error: `"expect.quantity" is not a known quantity: ${JSON.stringify(quantity)}` };
    return { text, expect: { type: 'measure', quantity }, locale: locale as Locale };
  }
  return { error: '"expect.type" must be "check" or "measure"' };
}

// A measurement is an answer with a measurement field and no answer field.
function toOutput(result: Interpretation): Output {
  switch (result.kind) {
    case 'answer':
      return result.answer === 'defect' && result.detail !== undefined
        ? { kind: 'answer', answer: 'defect', detail: result.detail }
        : { kind: 'answer', answer: result.answer };
    case 'measurement': {
      const { quantity, value, unit } = result.measurement;
      return { kind: 'answer', measurement: { quantity, value, unit } };
    }
    case 'command':
      return result.command === 'language'
        ? { kind: 'command', command: 'language', locale: result.locale }
        : { kind: 'command', command: result.command };
    case 'fixed':
      return result.measurement === undefined
        ? { kind: 'fixed', action: result.action }
        : {
            kind: 'fixed',
            action: result.action,
            measurement: {
              quantity: result.measurement.quantity,
              value: result.measurement.value,
              unit: result.measurement.unit,
            },
          };
    case 'no_gauge':
      return { kind: 'no_gauge' };
    case 'unclear':
      return { kind: 'unclear', reason: result.reason };
  }
}

function interpretLine(line: string): Output {
  if (line.trim() === '') return { error: 'Empty line: expected a JSON object' };
  const parsed = parseLine(line);
  if ('error' in parsed) return parsed;
  return toOutput(interpretUtterance([{ transcript: parsed.text }], parsed.expect, parsed.locale));
}

async function main(): Promise<void> {
  await Promise.all(LOCALES.map(loadAnswerWords));
  const lines = createInterface({ input: process.stdin, crlfDelay: Infinity });
  for await (const line of lines) {
    let output: Output;
    try {
      output = interpretLine(line);
    } catch (error) {
      output = { error: error instanceof Error ? error.message : String(error) };
    }
    process.stdout.write(`${JSON.stringify(output)}\n`);
  }
}

await main();
