import { z } from "zod";

/**
 * PostgreSQL text cannot hold the NUL character: one that reaches a query fails it with a
 * 500. Every request part is checked for it at the boundary (server/http/route.ts), so the
 * schemas themselves need not repeat the check; `plainText` is for input read outside a
 * route (files, forms) that wants the same rule.
 */
export const NUL_MESSAGE = "Must not contain the NUL character (\\u0000)";

/**
 * The path of the first string (value or object key) holding a NUL, or null. One pass,
 * no allocation unless found, so it costs next to nothing on every request.
 */
export function findNul(value: unknown, depth = 0): (string | number)[] | null {
  if (typeof value === "string") return value.includes("\0") ? [] : null;
  if (value === null || typeof value !== "object" || depth > 64) return null;
  if (Array.isArray(value)) {
    for (let i = 0; i < value.length; i++) {
      const inner = findNul(value[i], depth + 1);
      if (inner) return [i, ...inner];
    }
    return null;
  }
  for (const key in value) {
    if (!Object.prototype.hasOwnProperty.call(value, key)) continue;
    if (key.includes("\0")) return [key];
    const inner = findNul((value as Record<string, unknown>)[key], depth + 1);
    if (inner) return [key, ...inner];
  }
  return null;
}

export const plainText = () => z.string().refine((s) => !s.includes("\0"), NUL_MESSAGE);
