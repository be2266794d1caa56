/**
 * One rule for every piece of text that crosses a boundary: no NUL character. PostgreSQL refuses NUL in
 * text and jsonb (errors 22021 / 22P05), so a NUL that reached a query used to surface as a 500 or
 * "Something went wrong". Schemas refuse it with a field error instead, and `findNul` lets the action
 * guard check any raw input (record keys, draft values) before a schema sees it.
 */
import { z } from 'zod';

export const NUL_MESSAGE = 'Contains a NUL (zero) character, which cannot be stored: remove it and try again.';

export const hasNul = (s: string): boolean => s.includes('\u0000');

/** A string schema that refuses NUL: `noNul(z.string().max(80))`. */
export const noNul = <S extends z.ZodString>(s: S): S => s.refine((v) => !hasNul(v), { message: NUL_MESSAGE });

/**
 * Path of the first string (value or object key) holding a NUL in a plain JSON-like value, or null. Visits
 * at most `budget` nodes without recursion, so a huge or deeply nested input costs bounded time and
 * stack; what lies beyond the budget is left to the schema (whose strings refuse NUL too).
 */
export function findNul(value: unknown, budget = 20_000): (string | number)[] | null {
  interface Node {
    v: unknown;
    key: string | number | null;
    parent: Node | null;
  }
  const pathOf = (n: Node, last?: string): (string | number)[] => {
    const out: (string | number)[] = last === undefined ? [] : [last];
    for (let c: Node | null = n; c && c.key !== null; c = c.parent) out.unshift(c.key);
    return out;
  };
  const stack: Node[] = [{ v: value, key: null, parent: null }];
  for (let seen = 0; stack.length > 0 && seen < budget; seen++) {
    const n = stack.pop();
    if (!n) break;
    const { v } = n;
    if (typeof v === 'string') {
      if (hasNul(v)) return pathOf(n);
    } else if (Array.isArray(v)) {
      for (let i = Math.min(v.length, budget) - 1; i >= 0; i--) stack.push({ v: v[i], key: i, parent: n });
    } else if (v && typeof v === 'object' && !(v instanceof Date) && !(v instanceof Blob)) {
      const entries = Object.entries(v);
      for (const [k] of entries) if (hasNul(k)) return pathOf(n, k);
      for (const [k, child] of entries.slice(0, budget).reverse()) stack.push({ v: child, key: k, parent: n });
    }
  }
  return null;
}
