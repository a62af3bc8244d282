/**
 * Browser tests: `npx tsx tests/e2e/run.ts [name-filter…]` (npm test runs it with E2E_REPORT=<json path>).
 *
 * 1. Builds the client when dist/client is missing or older than its sources.
 * 2. Starts the app in-process on a free port with a new temporary database (demo seeded).
 * 3. Launches Debian's chromium through playwright-core with a fresh profile.
 * 4. Runs every default-exported test of tests/e2e/*.e2e.ts, each with a time limit, a fresh cookie jar and
 *    no open tabs; an uncaught error in the page fails the test.
 * 5. Prints one line per test and `N passed, N failed` last; writes {passed, failed} to E2E_REPORT; exits 1 on failure.
 */
import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, mkdtempSync, readdirSync, rmSync, statSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { chromium, request, type APIRequestContext, type BrowserContext, type Page } from 'playwright-core';
import { DEMO_PASSWORD, type E2EContext, type E2ESession, type E2ETest } from './harness';

const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');
const E2E_DIR = path.join(ROOT, 'tests', 'e2e');
const SCREENS_DIR = path.join(ROOT, '.tmp', 'screens');
const CLIENT_INDEX = path.join(ROOT, 'dist', 'client', 'index.html');
const CHROMIUM = process.env.CHROMIUM_PATH || '/usr/bin/chromium';
const DEFAULT_TIMEOUT_MS = 60_000;
const VIEWPORT = { width: 1280, height: 800 };
const CHROMIUM_ARGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

/** Newest modification time of the files below `dir` (skipping dot-folders and node_modules). */
function newestMtime(target: string): number {
  if (!existsSync(target)) return 0;
  const stat = statSync(target);
  if (!stat.isDirectory()) return stat.mtimeMs;
  let newest = 0;
  for (const entry of readdirSync(target, { withFileTypes: true })) {
    if (entry.name.startsWith('.') || entry.name === 'node_modules') continue;
    newest = Math.max(newest, newestMtime(path.join(target, entry.name)));
  }
  return newest;
}

function ensureClientBuilt(): void {
  const sources = ['src', 'shared', 'fonts', 'index.html', 'vite.config.ts', 'package.json'].map((p) => path.join(ROOT, p));
  const built = existsSync(CLIENT_INDEX) ? statSync(CLIENT_INDEX).mtimeMs : 0;
  if (built > Math.max(...sources.map(newestMtime))) return;
  console.log('building the client (vite build)…');
  const result = spawnSync(path.join(ROOT, 'node_modules', '.bin', 'vite'), ['build', '--logLevel', 'warn'], {
    cwd: ROOT,
    stdio: 'inherit',
  });
  if (result.status !== 0) throw new Error('vite build failed');
}

async function discoverTests(filters: string[]): Promise<Array<{ file: string; test: E2ETest } | { file: string; loadError: Error }>> {
  const files = readdirSync(E2E_DIR)
    .filter((f) => f.endsWith('.e2e.ts'))
    .sort();
  const out: Array<{ file: string; test: E2ETest } | { file: string; loadError: Error }> = [];
  for (const file of files) {
    try {
      const mod = (await import(pathToFileURL(path.join(E2E_DIR, file)).href)) as { default?: unknown };
      if (!Array.isArray(mod.default)) throw new Error('must default-export an array of { name, run(ctx) }');
      for (const test of mod.default as E2ETest[]) {
        const label = `${file.replace(/\.e2e\.ts$/, '')}: ${test.name}`;
        if (filters.length === 0 || filters.some((f) => label.toLowerCase().includes(f.toLowerCase()))) out.push({ file, test });
      }
    } catch (error) {
      out.push({ file, loadError: error instanceof Error ? error : new Error(String(error)) });
    }
  }
  return out;
}

function slug(text: string): string {
  return text
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-|-$/g, '')
    .slice(0, 80);
}

function withTimeout<T>(promise: Promise<T>, ms: number, what: string): Promise<T> {
  let timer: NodeJS.Timeout | undefined;
  const timeout = new Promise<never>((_, reject) => {
    timer = setTimeout(() => reject(new Error(`${what} took longer than ${Math.round(ms / 1000)} s`)), ms);
  });
  return Promise.race([promise, timeout]).finally(() => clearTimeout(timer));
}

async function launchContext(profileRoot: string): Promise<BrowserContext> {
  const dir = mkdtempSync(path.join(profileRoot, 'profile-'));
  return chromium.launchPersistentContext(dir, {
    executablePath: CHROMIUM,
    headless: true,
    args: CHROMIUM_ARGS,
    viewport: VIEWPORT,
    locale: 'en-GB',
    timezoneId: 'UTC',
  });
}

async function signIn(page: Page, baseUrl: string, email: string, password = DEMO_PASSWORD): Promise<void> {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'), { timeout: 15_000 });
}

async function main(): Promise<number> {
  const filters = process.argv.slice(2);
  const report = process.env.E2E_REPORT;
  let passed = 0;
  let failed = 0;
  const finish = () => {
    console.log(`\n${passed} passed, ${failed} failed`);
    if (report) {
      mkdirSync(path.dirname(report), { recursive: true });
      writeFileSync(report, JSON.stringify({ passed, failed }) + '\n');
    }
    return failed === 0 ? 0 : 1;
  };

  if (!existsSync(CHROMIUM)) {
    console.error(`chromium not found at ${CHROMIUM} (npm test installs Debian's chromium; or set CHROMIUM_PATH)`);
    failed += 1;
    return finish();
  }

  const tmp = mkdtempSync(path.join(os.tmpdir(), 'boxwright-e2e-'));
  mkdirSync(SCREENS_DIR, { recursive: true });
  let server: { url: string; close(): Promise<void> } | undefined;
  let context: BrowserContext | undefined;
  try {
    ensureClientBuilt();
    const { startServer } = await import('../../server/start');
    server = await startServer({
      port: 0,
      host: '127.0.0.1',
      dbPath: path.join(tmp, 'boxwright.sqlite'),
      sessionsPath: path.join(tmp, 'sessions.sqlite'),
      seed: true,
      quiet: true,
    });
    const baseUrl = server.url.replace(/\/$/, '');
    context = await launchContext(tmp);
    const mainContext = context;

    const tests = await discoverTests(filters);
    if (tests.length === 0) console.log('no browser tests matched');
    for (const entry of tests) {
      if ('loadError' in entry) {
        failed += 1;
        console.log(`✗ ${entry.file}: could not load: ${entry.loadError.message}`);
        continue;
      }
      const { file, test } = entry;
      const label = `${file.replace(/\.e2e\.ts$/, '')}: ${test.name}`;
      const started = Date.now();
      const pageErrors: string[] = [];
      const extraContexts: BrowserContext[] = [];
      const apis: APIRequestContext[] = [];
      let lastPage: Page | undefined;
      const watch = (page: Page) => {
        lastPage = page;
        page.on('pageerror', (error) => pageErrors.push(error.message));
        return page;
      };

      // Tabs first (a late answer to an old tab could set a cookie again), then the cookies.
      for (const page of mainContext.pages()) await page.close();
      await mainContext.clearCookies();

      const ctx: E2EContext = {
        baseUrl,
        page: async () => watch(await mainContext.newPage()),
        screenshot: async (name, page) => {
          const target = page ?? lastPage;
          if (!target) throw new Error('screenshot: no page is open');
          const file = path.join(SCREENS_DIR, `${slug(name)}.png`);
          await target.screenshot({ path: file });
          return file;
        },
        newSession: async (): Promise<E2ESession> => {
          const extra = await launchContext(tmp);
          extraContexts.push(extra);
          for (const page of extra.pages()) await page.close();
          return { page: async () => watch(await extra.newPage()) };
        },
        api: async (email, password = DEMO_PASSWORD) => {
          const client = await request.newContext({ baseURL: baseUrl });
          apis.push(client);
          const response = await client.post('/api/auth/login', { data: { email, password } });
          if (!response.ok()) throw new Error(`signing in ${email} over the API failed: HTTP ${response.status()}`);
          return client;
        },
        signIn: (page, email, password) => signIn(page, baseUrl, email, password),
      };

      try {
        await withTimeout(test.run(ctx), test.timeoutMs ?? DEFAULT_TIMEOUT_MS, 'the test');
        if (pageErrors.length > 0) throw new Error(`uncaught error in the page: ${pageErrors[0]}`);
        passed += 1;
        console.log(`✓ ${label} (${((Date.now() - started) / 1000).toFixed(1)} s)`);
      } catch (error) {
        failed += 1;
        const message = error instanceof Error ? error.message.split('\n').slice(0, 6).join('\n    ') : String(error);
        console.log(`✗ ${label}\n    ${message}`);
        if (lastPage && !lastPage.isClosed()) {
          const shot = path.join(SCREENS_DIR, `failed-${slug(label)}.png`);
          await lastPage.screenshot({ path: shot }).then(
            () => console.log(`    screenshot: ${path.relative(ROOT, shot)}`),
            () => undefined,
          );
        }
      } finally {
        for (const client of apis) await client.dispose().catch(() => undefined);
        for (const extra of extraContexts) await extra.close().catch(() => undefined);
      }
    }
  } catch (error) {
    failed += 1;
    console.error(`browser tests could not run: ${error instanceof Error ? error.message : String(error)}`);
  } finally {
    await context?.close().catch(() => undefined);
    await server?.close().catch(() => undefined);
    rmSync(tmp, { recursive: true, force: true });
  }
  return finish();
}

main().then(
  (code) => process.exit(code),
  (error: unknown) => {
    console.error(error);
    process.exit(1);
  },
);
