import { useSyncExternalStore } from 'react';
import type { EditorState, StudioEditor } from '../model/editor';

/** The editor's state, re-rendering on every change (useSyncExternalStore over its subscribe). */
export function useEditorState(editor: StudioEditor): EditorState {
  return useSyncExternalStore(editor.subscribe, editor.getState, editor.getState);
}
