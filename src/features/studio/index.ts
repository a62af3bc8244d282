/**
 * The design studio feature. Load it lazily (konva is a large chunk, STACK.md trap 9):
 * `const DesignStudio = lazy(() => import('…/features/studio'))`.
 * The conflict dialog lives in './conflict' so a page can show it without loading konva.
 */
export { DesignStudio, default } from './components/design-studio';
export type { DesignStudioProps } from './components/design-studio';
export type { StudioDoc, UnitSystem } from './model/types';
