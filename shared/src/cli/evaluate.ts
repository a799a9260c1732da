// Reads measurements as JSON lines on stdin and writes one verdict (or error) per line, in order.
// Input:  {"quantity": "tread_depth", "value": 3, "unit": "in/32", "context": {"axle": "steer"}}
// Output: {"verdict", "limit", "unit", "source", "say"} or {"error": "message"}. Blank lines are skipped.
// An optional "locale" ("en" or "es") chooses the language of "say".
import { createInterface } from 'node:readline';
import { LOCALES, type Locale, type MeasurementContext } from '../checklist/types.js';
import { LimitError, evaluateMeasurement } from '../limits/index.js';
import { isQuantity } from '../units/index.js';

export function evaluateLine(line: string): Record<string, unknown> {
  let input: unknown;
  try {
    input = JSON.parse(line);
  } catch {
    return { error: 'The line is not valid JSON.' };
  }
  if (typeof input !== 'object' || input === null || Array.isArray(input)) {
    return { error: 'Each line must be a JSON object with quantity, value, unit and context.' };
  }
  const { quantity, value, unit, context, locale } = input as Record<string, unknown>;
  if (!isQuantity(quantity)) {
    return { error: `Unknown quantity ${JSON.stringify(quantity) ?? 'undefined'}.` };
  }
  if (typeof value !== 'number') {
    return { error: 'The value must be a number.' };
  }
  if (typeof unit !== 'string') {
    return { error: 'The unit must be a string such as "in/32", "mm" or "psi".' };
  }
  if (locale !== undefined && !(LOCALES as readonly unknown[]).includes(locale)) {
    return { error: `Unknown locale ${JSON.stringify(locale)}; use one of: ${LOCALES.join(', ')}.` };
  }
  try {
    const result = evaluateMeasurement(
      quantity,
      value,
      unit,
      context as MeasurementContext,
      (locale ?? 'en') as Locale,
    );
    return { verdict: result.verdict, limit: result.limit, unit: result.unit, source: result.source, say: result.say };
  } catch (error) {
    if (error instanceof LimitError) return { error: error.message };
    throw error;
  }
}

async function main(): Promise<void> {
  const lines = createInterface({ input: process.stdin, crlfDelay: Infinity });
  for await (const line of lines) {
    if (line.trim() === '') continue;
    process.stdout.write(`${JSON.stringify(evaluateLine(line))}\n`);
  }
}

main().catch((error: unknown) => {
  process.stderr.write(`${error instanceof Error ? error.message : String(error)}\n`);
  process.exitCode = 1;
});
