/** What the design page needs around saving, without konva: the conflict's changed fields, and units. */
export { ConflictChanges } from './components/conflict-changes';
export type { ConflictChangesProps } from './components/conflict-changes';
export { diffDesigns, type FieldChange } from './model/diff';
export { saveUnits } from './api/save-units';
