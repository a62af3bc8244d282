import { ZodError, type z } from 'zod';

/**
 * Parses an update body `{version, <key>: …}`. Errors inside `<key>` keep the paths a create uses
 * (`outer.width`, not `design.outer.width`), so one form maps both; a ZodError becomes a 400 with `fields`.
 */
export function parseVersionedBody<S extends z.ZodType>(schema: S, body: unknown, key: string): z.output<S> {
  const result = schema.safeParse(body);
  if (result.success) return result.data;
  throw new ZodError(result.error.issues.map((issue) => (issue.path[0] === key ? { ...issue, path: issue.path.slice(1) } : issue)));
}
