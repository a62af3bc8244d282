/**
 * Whether two designs say the same thing. JSON with sorted keys, where a key holding `undefined` counts as
 * absent: react-hook-form adds such keys for empty optional inputs, which its own isDirty counts as a change.
 */
export function canonicalJson(value: unknown): string {
  return JSON.stringify(value, (_key, v: unknown) => {
    if (v && typeof v === 'object' && !Array.isArray(v)) {
      const sorted: Record<string, unknown> = {};
      for (const key of Object.keys(v).sort()) {
        const item = (v as Record<string, unknown>)[key];
        if (item !== undefined) sorted[key] = item;
      }
      return sorted;
    }
    return v;
  });
}

export function sameDesign(a: unknown, b: unknown): boolean {
  return canonicalJson(a) === canonicalJson(b);
}
