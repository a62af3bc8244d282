/**
 * Error codes and the JSON error shape of PRODUCT.md §8: `{"error": {"code", "message", "fields"?}}`.
 * `fields` maps a field path such as `braces[1].position` to a message.
 */
export const ERROR_CODES = {
  invalid: 'invalid_input',
  unauthenticated: 'not_signed_in',
  forbidden: 'forbidden',
  notFound: 'not_found',
  conflict: 'edited_elsewhere',
  rateLimited: 'too_many_attempts',
  internal: 'internal_error',
} as const;
export type ErrorCode = (typeof ERROR_CODES)[keyof typeof ERROR_CODES];

export interface ErrorBody {
  error: { code: ErrorCode | string; message: string; fields?: Record<string, string> };
}

/** Formats a path like ['braces', 1, 'position'] as `braces[1].position`. */
export function formatFieldPath(path: ReadonlyArray<PropertyKey>): string {
  let out = '';
  for (const part of path) {
    if (typeof part === 'number') out += `[${part}]`;
    else out += out === '' ? String(part) : `.${String(part)}`;
  }
  return out;
}

export interface IssueLike {
  path: ReadonlyArray<PropertyKey>;
  message: string;
}

/** Turns validation issues (zod's or the engine's) into `fields`, keeping the first message per path. */
export function issuesToFields(issues: ReadonlyArray<IssueLike>, prefix: ReadonlyArray<PropertyKey> = []): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of issues) {
    const key = formatFieldPath([...prefix, ...issue.path]) || '(root)';
    if (!(key in fields)) fields[key] = issue.message;
  }
  return fields;
}

/** One line naming the first field and its problem, for CLIs and toasts. */
export function describeFields(fields: Record<string, string>): string {
  const entries = Object.entries(fields);
  if (entries.length === 0) return 'invalid input';
  const [first, message] = entries[0]!;
  const more = entries.length > 1 ? ` (and ${entries.length - 1} more)` : '';
  return `${first}: ${message}${more}`;
}
