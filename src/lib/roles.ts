import type { Role } from '../../shared/schemas/api.schema';

export const ROLE_LABELS: Record<Role, string> = {
  owner: 'Owner',
  designer: 'Designer',
  maker: 'Maker',
  viewer: 'Viewer',
};

/** What each role may do, in plain words (PRODUCT.md §2). */
export const ROLE_DESCRIPTIONS: Record<Role, string> = {
  owner: 'Everything, plus members and workshop settings',
  designer: 'Creates, edits, duplicates and deletes designs; runs cut plans; exports',
  maker: 'Reads designs; runs cut plans; exports and prints; ticks parts cut; manages stock',
  viewer: 'Reads the designs, plans and exports it is shown',
};
