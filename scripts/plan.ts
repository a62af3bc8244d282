/**
 * `npm run --silent plan -- FILE` — reads a design JSON (PRODUCT.md §8) and prints its plan JSON on stdout.
 * FILE `-` reads standard input. Invalid input (unreadable file, bad JSON, a design that cannot be planned)
 * exits 1 with one line on stderr, never a stack trace.
 */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { planDesign } from '../shared/cabinet/index.js';

function fail(message: string): never {
  process.stderr.write(`plan: ${message.replace(/\s*\n\s*/g, ' ')}\n`);
  process.exit(1);
}

function main(): void {
  const args = process.argv.slice(2).filter((a) => a !== '--');
  const compact = args.includes('--compact');
  const files = args.filter((a) => a !== '--compact');
  if (files.length !== 1) fail('usage: npm run --silent plan -- FILE [--compact]  (FILE is a design JSON, or - for standard input)');
  const file = files[0]!;
  let text: string;
  try {
    // npm runs scripts from the package folder; a relative FILE means the folder the user ran npm in.
    text = file === '-' ? readFileSync(0, 'utf8') : readFileSync(path.resolve(process.env.INIT_CWD ?? process.cwd(), file), 'utf8');
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    fail(`cannot read ${file}${code === 'ENOENT' ? ': no such file' : code === 'EISDIR' ? ': it is a folder' : code ? ` (${code})` : ''}`);
  }
  let input: unknown;
  try {
    input = JSON.parse(text);
  } catch (e) {
    fail(`${file} is not valid JSON: ${(e as Error).message}`);
  }
  const outcome = planDesign(input);
  if (!outcome.ok) fail(`invalid design in ${file}: ${outcome.message}`);
  process.stdout.write(`${JSON.stringify(outcome.plan, null, compact ? undefined : 2)}\n`);
}

try {
  main();
} catch (e) {
  fail(`could not plan the design: ${e instanceof Error ? e.message : String(e)}`);
}
