/**
 * Types and helpers for browser tests. A test file `tests/e2e/<name>.e2e.ts` default-exports an array of
 * `E2ETest`; tests/e2e/run.ts discovers and runs them against the real app (in-process server, built client,
 * Debian's chromium through playwright-core).
 */
import type { APIRequestContext, Page } from 'playwright-core';
import { DEMO_EMAILS, DEMO_PASSWORD } from '../../server/seed';

export interface E2ESession {
  /** A new tab in this session (its own cookies, separate from the main one). */
  page(): Promise<Page>;
}

export interface E2EContext {
  /** e.g. `http://127.0.0.1:41234` (no trailing slash). */
  baseUrl: string;
  /** A new tab in the test's browser session. Every test starts with no cookies and no open tabs. */
  page(): Promise<Page>;
  /**
   * Saves a PNG to .tmp/screens/<name>.png (1280×800 viewport unless the page was resized) and returns
   * its path. Shoots `page`, or the tab opened last.
   */
  screenshot(name: string, page?: Page): Promise<string>;
  /** Another, independent browser session (a second person at another computer). Closed after the test. */
  newSession(): Promise<E2ESession>;
  /** An HTTP client signed in as `email` (its own cookie jar), for arranging data or acting as someone else. */
  api(email: string, password?: string): Promise<APIRequestContext>;
  /** Signs `page` in through the sign-in form and waits until the app has left the sign-in page. */
  signIn(page: Page, email: string, password?: string): Promise<void>;
}

export interface E2ETest {
  name: string;
  run(ctx: E2EContext): Promise<void>;
  /** Default 60 s. */
  timeoutMs?: number;
}

/** The demo sign-ins the server seeds (PRODUCT.md §9; printed by `npm start`). */
export { DEMO_PASSWORD };
export const DEMO = DEMO_EMAILS;

/** Throws with `message` when `condition` is false: tests assert with plain checks and clear words. */
export function expect(condition: unknown, message: string): asserts condition {
  if (!condition) throw new Error(message);
}
