// Which of a few items a short reply names ("the hub", "inner one"), for "which one?" after a problem
// named at a stop without its item. The longest name heard wins, so "outer tire" beats "tire".
import { normaliseText, type ChecklistItem, type Locale } from '@yardcall/shared';

function containsRun(haystack: readonly string[], needle: readonly string[]): boolean {
  if (needle.length === 0 || needle.length > haystack.length) return false;
  for (let start = 0; start + needle.length <= haystack.length; start += 1) {
    if (needle.every((stem, i) => haystack[start + i] === stem)) return true;
  }
  return false;
}

export function namedItemKeys(reply: string, items: readonly ChecklistItem[], locale: Locale): string[] {
  const heard = normaliseText(reply, locale).stems;
  let best = 0;
  let keys: string[] = [];
  for (const item of items) {
    const longest = Math.max(
      0,
      ...[item.name, ...item.names]
        .map((name) => normaliseText(name, locale).stems)
        .filter((stems) => containsRun(heard, stems))
        .map((stems) => stems.length),
    );
    if (longest === 0) continue;
    if (longest > best) {
      best = longest;
      keys = [item.key];
    } else if (longest === best) keys.push(item.key);
  }
  return keys;
}
