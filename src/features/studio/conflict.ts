/** The "edited elsewhere" dialog and its field diff, without konva. */
export { ConflictChanges, ConflictDialog } from './components/conflict-dialog';
export type { ConflictChangesProps, ConflictDialogProps } from './components/conflict-dialog';
export { diffDesigns, type FieldChange } from './model/diff';
export { saveUnits } from './api/save-units';
