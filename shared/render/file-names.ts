/**
 * File names a person understands: `harbour-bookshelf-stencils-a4.pdf`, `…-cut-diagrams.pdf`,
 * `…-panels.dxf`, `…-cut-list.csv`.
 */

/** Lower-case ASCII words joined by hyphens; accents dropped; at most `maxLength` characters. */
export function slugify(value: string, maxLength = 60): string {
  const slug = value
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '');
  const cut = slug.slice(0, maxLength).replace(/-+$/g, '');
  return cut || 'boxwright';
}

export type ExportKind = 'stencils' | 'cut-diagrams' | 'cut-diagram-svg' | 'panels-dxf' | 'cut-list';

/**
 * The download name of an export. `detail` is the paper slug for stencils ("a4", "roll-610mm") and
 * the sheet number for one SVG sheet.
 */
export function exportFileName(baseName: string, kind: ExportKind, detail?: string): string {
  const base = slugify(baseName);
  switch (kind) {
    case 'stencils':
      return `${base}-stencils${detail ? `-${slugify(detail)}` : ''}.pdf`;
    case 'cut-diagrams':
      return `${base}-cut-diagrams.pdf`;
    case 'cut-diagram-svg':
      return `${base}-cut-diagram${detail ? `-${slugify(detail)}` : ''}.svg`;
    case 'panels-dxf':
      return `${base}-panels.dxf`;
    case 'cut-list':
      return `${base}-cut-list.csv`;
  }
}
