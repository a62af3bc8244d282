/**
 * A tiny notice store for messages that have no place on the page (a background refresh failed,
 * a copy was made). Forms show their own errors inline instead, so a failure is reported once.
 */
import { useSyncExternalStore } from 'react';

export type NoticeTone = 'info' | 'success' | 'error';
export interface Notice {
  id: number;
  tone: NoticeTone;
  message: string;
}

let notices: Notice[] = [];
let nextId = 1;
const listeners = new Set<() => void>();
const emit = () => listeners.forEach((listener) => listener());

export function notify(message: string, tone: NoticeTone = 'info', timeoutMs = 5000): number {
  const id = nextId++;
  // The same message twice in a row (e.g. several queries failing together) is shown once.
  if (notices.some((n) => n.message === message && n.tone === tone)) return id;
  notices = [...notices, { id, tone, message }];
  emit();
  if (timeoutMs > 0) setTimeout(() => dismiss(id), timeoutMs);
  return id;
}

export function dismiss(id: number): void {
  const next = notices.filter((n) => n.id !== id);
  if (next.length === notices.length) return;
  notices = next;
  emit();
}

function subscribe(listener: () => void) {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

export function useNotices(): Notice[] {
  return useSyncExternalStore(subscribe, () => notices, () => notices);
}
