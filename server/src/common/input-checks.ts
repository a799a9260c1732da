import type { FieldProblem } from '@yardcall/shared';

// Where @nestjs/swagger keeps each DTO property's OpenAPI options (its DECORATORS.API_MODEL_PROPERTIES).
const API_MODEL_PROPERTIES = 'swagger/apiModelProperties';

const NUL_MESSAGE = 'This text holds a NUL character (U+0000), which no field accepts: remove it.';
const SURROGATE_MESSAGE =
  'This text holds a broken character (an unpaired UTF-16 surrogate): send it as valid Unicode.';
const NULL_MESSAGE = 'This field cannot be null: leave it out, or send a value.';

// A high surrogate not followed by a low one, or a low one not preceded by a high one.
const LONE_SURROGATE = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;

function pathOf(parent: string, key: string | number): string {
  return parent ? `${parent}.${key}` : String(key);
}

function textProblem(text: string): string | null {
  if (text.includes('\u0000')) return NUL_MESSAGE;
  // PostgreSQL and UTF-8 cannot hold a lone surrogate; Node would silently turn it into U+FFFD.
  if (LONE_SURROGATE.test(text)) return SURROGATE_MESSAGE;
  return null;
}

// Every string (and key) of a request's body, query or parameter that PostgreSQL could not store as
// given: NUL characters and unpaired surrogates. Iterative, so a deep body cannot exhaust the stack.
export function findUnsafeText(value: unknown, root = ''): FieldProblem[] {
  const problems: FieldProblem[] = [];
  const stack: [unknown, string][] = [[value, root]];
  while (stack.length > 0) {
    const [current, path] = stack.pop() as [unknown, string];
    if (typeof current === 'string') {
      const message = textProblem(current);
      if (message) problems.push({ field: path || 'body', message });
    } else if (Array.isArray(current)) {
      current.forEach((item, index) => stack.push([item, pathOf(path, index)]));
    } else if (current !== null && typeof current === 'object') {
      for (const [key, item] of Object.entries(current)) {
        const keyMessage = textProblem(key);
        if (keyMessage) {
          problems.push({ field: pathOf(path, JSON.stringify(key)), message: keyMessage });
          continue;
        }
        stack.push([item, pathOf(path, key)]);
      }
    }
  }
  return problems.sort((a, b) => a.field.localeCompare(b.field));
}

// Every null in a transformed DTO where the contract (the DTO's OpenAPI property) does not say
// nullable. class-validator's @IsOptional lets null through as if the field were absent; the contract
// does not. Nested DTOs are instances of their own classes (class-transformer's @Type), so each
// level reads its own class's properties; free-form objects (no metadata) are left alone.
export function findForbiddenNulls(value: unknown, root = ''): FieldProblem[] {
  const problems: FieldProblem[] = [];
  const stack: [unknown, string][] = [[value, root]];
  while (stack.length > 0) {
    const [current, path] = stack.pop() as [unknown, string];
    if (Array.isArray(current)) {
      current.forEach((item, index) => stack.push([item, pathOf(path, index)]));
      continue;
    }
    if (current === null || typeof current !== 'object') continue;
    const prototype: unknown = Object.getPrototypeOf(current);
    for (const [key, item] of Object.entries(current)) {
      if (item === null) {
        const options = Reflect.getMetadata(API_MODEL_PROPERTIES, prototype as object, key) as
          { nullable?: boolean } | undefined;
        if (options && options.nullable !== true) problems.push({ field: pathOf(path, key), message: NULL_MESSAGE });
      } else if (typeof item === 'object') {
        stack.push([item, pathOf(path, key)]);
      }
    }
  }
  return problems.sort((a, b) => a.field.localeCompare(b.field));
}

// The deepest nesting of objects and arrays in raw JSON text, read without parsing it; stops counting
// once past `stopAbove`.
export function jsonNestingDepth(json: Buffer, stopAbove = Number.POSITIVE_INFINITY): number {
  let depth = 0;
  let deepest = 0;
  let inString = false;
  for (let i = 0; i < json.length; i += 1) {
    const byte = json[i];
    if (inString) {
      if (byte === 0x5c)
        i += 1; // backslash: skip the escaped byte
      else if (byte === 0x22) inString = false;
    } else if (byte === 0x22) {
      inString = true;
    } else if (byte === 0x7b || byte === 0x5b) {
      depth += 1;
      if (depth > deepest) {
        deepest = depth;
        if (deepest > stopAbove) return deepest;
      }
    } else if (byte === 0x7d || byte === 0x5d) {
      depth -= 1;
    }
  }
  return deepest;
}
