/**
 * `npm run --silent nest -- FILE`: reads a nest job JSON (PRODUCT.md §8) and prints the layout JSON.
 * Invalid input: one clear line on stderr and exit code 1.
 */
import { readFileSync } from 'node:fs';
import { performance } from 'node:perf_hooks';
import { nest, parseNestJob } from '../shared/nesting/index.js';

function fail(message: string): never {
  process.stderr.write(`nest: ${message}\n`);
  process.exit(1);
}

const file = process.argv[2];
if (!file) fail('usage: npm run --silent nest -- FILE (a nest job JSON file)');
let text: string;
try {
  text = readFileSync(file, 'utf8');
} catch (e) {
  fail(`cannot read ${file}: ${(e as NodeJS.ErrnoException).code ?? 'read error'}`);
}
let input: unknown;
try {
  input = JSON.parse(text);
} catch (e) {
  fail(`${file} is not valid JSON (${(e as Error).message})`);
}
const parsed = parseNestJob(input);
if (!parsed.ok) fail(`invalid nest job: ${parsed.message}`);
try {
  const layout = nest(parsed.job, { now: () => performance.now() });
  process.stdout.write(JSON.stringify(layout, null, 2) + '\n');
} catch (e) {
  fail(`could not nest the job: ${(e as Error).message}`);
}
