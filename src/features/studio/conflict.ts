/** The "edited elsewhere" dialog and its field diff, without konva. */
export { ConflictDialog } from './components/conflict-dialog';
export type { ConflictDialogProps } from './components/conflict-dialog';
export { diffDesigns, type FieldChange } from './model/diff';
