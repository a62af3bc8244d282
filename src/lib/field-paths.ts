/**
 * Field paths: the API names fields as `braces[1].position` (shared/errors.ts formatFieldPath); react-hook-form
 * names the same field `braces.1.position` (dot notation for array indices).
 */

/** `(root)` is what shared/errors.ts uses for an issue about the whole body. */
export const ROOT_PATH = '(root)';

/**
 * Converts an API field path to a react-hook-form path.
 * `braces[1].windows[0].u` → `braces.1.windows.0.u`; with `stripPrefix: 'design'`,
 * `design.outer.width` → `outer.width` (the PUT body wraps the design as `{version, design}`).
 * Returns '' for the root.
 */
export function toFormPath(apiPath: string, stripPrefix?: string): string {
  if (apiPath === ROOT_PATH || apiPath === '') return '';
  let path = apiPath.replace(/\[(\d+)\]/g, '.$1').replace(/^\./, '');
  if (stripPrefix) {
    if (path === stripPrefix) return '';
    if (path.startsWith(`${stripPrefix}.`)) path = path.slice(stripPrefix.length + 1);
  }
  return path;
}

/** The inverse, for messages and tests: `braces.1.position` → `braces[1].position`. */
export function toApiPath(formPath: string): string {
  if (formPath === '') return ROOT_PATH;
  return formPath
    .split('.')
    .map((part, i) => (/^\d+$/.test(part) ? `[${part}]` : i === 0 ? part : `.${part}`))
    .join('');
}

export interface FieldMessage {
  /** react-hook-form path ('' for the whole form). */
  formPath: string;
  message: string;
}

/** Splits an API `fields` object into form paths, in the order the server sent them. */
export function fieldMessages(fields: Record<string, string>, stripPrefix?: string): FieldMessage[] {
  return Object.entries(fields).map(([path, message]) => ({ formPath: toFormPath(path, stripPrefix), message }));
}

const SECTION_LABELS: Record<string, string> = {
  braces: 'Brace',
  openings: 'Opening',
  windows: 'window',
};

/** A short human label for a form path: `braces.1.windows.0.u` → `Brace 2 › window 1 › u`. */
export function describeFormPath(formPath: string): string {
  if (formPath === '') return 'Design';
  const parts = formPath.split('.');
  const out: string[] = [];
  for (let i = 0; i < parts.length; i += 1) {
    const part = parts[i]!;
    const next = parts[i + 1];
    if (SECTION_LABELS[part] && next !== undefined && /^\d+$/.test(next)) {
      out.push(`${SECTION_LABELS[part]} ${Number(next) + 1}`);
      i += 1;
    } else {
      out.push(part);
    }
  }
  return out.join(' › ');
}
