/**
 * Issue 5, "done when": a designer builds the demo bookshelf (shared/demo/designs.ts DEMO_BOOKSHELF, the invented
 * scenario of PRODUCT.md §9) from a blank design with the mouse and the keyboard alone, as a person would: "New
 * design" on the designs list, then only the studio's palette, drags on the canvas, arrow-key nudges and values typed
 * into the studio's inspector or the side form. No API call sets the design. Saved, its plan from the server
 * (GET …/plan) must give the same panels and lining pieces as the demo design, its net volume within 0.1 L and its
 * port tuning within 0.5 Hz. The reference plan comes from planDesign (shared/cabinet), the engine `npm run plan` runs.
 * The flow's elapsed time and the number of clicks and key presses are printed (a measurement, not an assertion:
 * the test's time limit is its only bound).
 */
import type { Locator, Page } from 'playwright-core';
import { DEMO_BOOKSHELF } from '../../shared/demo/designs';
import { planDesign } from '../../shared/cabinet/index';
import { designSchema, type Design } from '../../shared/schemas/design.schema';
import type { Plan } from '../../shared/schemas/plan.types';
import { parseLength } from '../../shared/units/index';
import type { ViewName } from '../../src/features/studio/model/types';
import { layoutViews } from '../../src/features/studio/model/views';
import { DEMO, expect, type E2ETest } from './harness';

const NAME = 'Bookshelf drawn in the studio';

/** Counts what the person does, to print beside the time. */
class Person {
  clicks = 0;
  keys = 0;
  drags = 0;
  constructor(readonly page: Page) {}

  async click(target: Locator): Promise<void> {
    this.clicks += 1;
    await target.click();
  }

  async press(key: string, times = 1): Promise<void> {
    for (let i = 0; i < times; i++) {
      this.keys += 1;
      await this.page.keyboard.press(key);
    }
  }

  /** Types into a box as a person does: click it, select what is there, type, Enter. */
  async typeInto(target: Locator, text: string): Promise<void> {
    await this.click(target);
    await this.press('Control+A');
    this.keys += text.length;
    await this.page.keyboard.type(text);
    await this.press('Enter');
  }

  /** Picks another option of a select with the arrow keys (the select has the focus, as after Tab). */
  async chooseWithArrows(select: Locator, wanted: string): Promise<void> {
    await select.focus();
    const options = await select.locator('option').evaluateAll((els) => els.map((e) => (e as HTMLOptionElement).value));
    const from = options.indexOf(await select.inputValue());
    const to = options.indexOf(wanted);
    expect(to >= 0, `the select should offer "${wanted}", it offers ${options.join(', ')}`);
    await this.press(to > from ? 'ArrowDown' : 'ArrowUp', Math.abs(to - from));
    expect((await select.inputValue()) === wanted, `the select should now be "${wanted}"`);
  }

  async drag(from: { x: number; y: number }, dxPx: number, dyPx: number): Promise<void> {
    this.drags += 1;
    const m = this.page.mouse;
    await m.move(from.x, from.y);
    await m.down();
    for (let i = 1; i <= 10; i++) await m.move(from.x + (dxPx * i) / 10, from.y + (dyPx * i) / 10);
    await m.up();
  }
}

/** Page coordinates of a box point (h, v along the view's two axes) in one drawing, from the canvas's camera. */
async function pagePoint(page: Page, design: Design, view: ViewName, h: number, v: number) {
  const canvas = page.getByTestId('studio-canvas');
  const box = await canvas.boundingBox();
  expect(box, 'the studio canvas should be on the page');
  const camera = JSON.parse((await canvas.getAttribute('data-camera')) ?? '{}') as { zoom: number; x: number; y: number };
  const l = layoutViews(design).views[view];
  return { x: box.x + camera.x + (l.ox + h) * camera.zoom, y: box.y + camera.y - (l.oy + v) * camera.zoom, zoom: camera.zoom };
}

/** The millimetres an inspector box shows (`215 mm`). */
async function shownMm(field: Locator): Promise<number> {
  const text = await field.inputValue();
  const r = parseLength(text, 'mm');
  expect(r.ok, `the inspector should show a length, it shows "${text}"`);
  return r.mm;
}

/** Arrow-key nudges on the 1 mm grid until the selection's coordinate reads `targetMm` (Shift = 10 mm). */
async function nudgeTo(person: Person, field: Locator, targetMm: number, up: string, down: string): Promise<void> {
  const diff = Math.round(targetMm - (await shownMm(field)));
  const key = diff > 0 ? up : down;
  await person.press(`Shift+${key}`, Math.floor(Math.abs(diff) / 10));
  await person.press(key, Math.abs(diff) % 10);
  const now = await shownMm(field);
  expect(Math.abs(now - targetMm) < 1e-9, `after nudging, the coordinate should be ${targetMm} mm, it is ${now} mm`);
}

/** Deep comparison with a tolerance for numbers; returns the first difference, or null. */
function firstDifference(a: unknown, b: unknown, path: string, tol: number): string | null {
  if (typeof a === 'number' && typeof b === 'number') return Math.abs(a - b) <= tol ? null : `${path}: ${a} ≠ ${b}`;
  if (Array.isArray(a) && Array.isArray(b)) {
    if (a.length !== b.length) return `${path}: ${a.length} items ≠ ${b.length}`;
    for (let i = 0; i < a.length; i++) {
      const d = firstDifference(a[i], b[i], `${path}[${i}]`, tol);
      if (d) return d;
    }
    return null;
  }
  if (a && b && typeof a === 'object' && typeof b === 'object') {
    const keys = new Set([...Object.keys(a), ...Object.keys(b)]);
    for (const k of keys) {
      const d = firstDifference((a as Record<string, unknown>)[k], (b as Record<string, unknown>)[k], `${path}.${k}`, tol);
      if (d) return d;
    }
    return null;
  }
  return Object.is(a, b) ? null : `${path}: ${JSON.stringify(a)} ≠ ${JSON.stringify(b)}`;
}

const tests: E2ETest[] = [
  {
    name: 'a designer builds the demo bookshelf from a blank design with mouse and keyboard, and it plans like the demo',
    timeoutMs: 180_000,
    async run(ctx) {
      const target = designSchema.parse(DEMO_BOOKSHELF);
      const reference = planDesign(target);
      expect(reference.ok, 'the demo bookshelf should plan');
      const page = await ctx.page();
      await ctx.signIn(page, DEMO.designer);
      await page.getByTestId('designs-table').waitFor();
      const person = new Person(page);
      const started = Date.now();

      // A blank design of the bookshelf's outer size.
      await person.click(page.getByRole('button', { name: 'New design' }));
      const dialog = page.getByRole('dialog');
      await dialog.getByLabel('Name').waitFor();
      person.keys += NAME.length;
      await page.keyboard.type(NAME); // the name box has the focus
      for (const [label, mm] of [['Width', 220], ['Height', 360], ['Depth', 260]] as const) {
        await person.click(dialog.getByLabel(label, { exact: true }));
        await person.press('Control+A');
        person.keys += String(mm).length;
        await page.keyboard.type(String(mm));
      }
      await person.press('Enter'); // submits the dialog
      await page.waitForURL(/\/designs\/\d+$/);
      const studio = page.getByTestId('design-studio');
      await page.locator('[data-testid=studio-canvas] canvas').first().waitFor({ timeout: 20_000 });
      await page.getByTestId('fig-net').waitFor();
      const field = (path: string) => studio.getByTestId(`field-${path}`);
      const palette = (label: string) => studio.getByRole('button', { name: label, exact: true });

      // The baffle is one panel thick, written out as the demo has it.
      await person.typeInto(field('baffleThickness'), '18');

      // The shelf brace: from the palette, dragged up in the side section, nudged to 215 mm; its window made
      // rectangular and sized.
      await person.click(palette('Shelf brace'));
      const brace = await pagePoint(page, target, 'side', 18 + 12, 180);
      await person.drag(brace, 0, -35 * brace.zoom);
      await nudgeTo(person, field('braces.0.position'), 215, 'ArrowUp', 'ArrowDown');
      await person.chooseWithArrows(field('braces.0.windows.0.shape'), 'rect');
      await person.typeInto(field('braces.0.windows.0.u'), '110');
      await person.typeInto(field('braces.0.windows.0.v'), '130');
      await person.typeInto(field('braces.0.windows.0.width'), '110');
      await person.typeInto(field('braces.0.windows.0.height'), '120');

      // The woofer: cut-out, displacement, rebate and screw holes, cone area and excursion; dragged down on the
      // front to 135 mm.
      await person.click(palette('Driver'));
      await person.typeInto(field('openings.0.diameter'), '118');
      await person.typeInto(field('openings.0.displacementLitres'), '0.3');
      await person.click(studio.getByTestId('toggle-openings.0.rebate'));
      await person.typeInto(field('openings.0.rebate.diameter'), '134');
      await person.typeInto(field('openings.0.rebate.depth'), '5');
      await person.click(studio.getByTestId('toggle-openings.0.screwHoles'));
      await person.typeInto(field('openings.0.screwHoles.count'), '4');
      await person.typeInto(field('openings.0.screwHoles.circleDiameter'), '126');
      await person.typeInto(field('openings.0.screwHoles.holeDiameter'), '4');
      await person.typeInto(field('openings.0.coneAreaCm2'), '85');
      await person.typeInto(field('openings.0.excursionMm'), '4');
      const woofer = await pagePoint(page, target, 'front', 110, 180);
      await person.drag(woofer, 0, 45 * woofer.zoom);
      await nudgeTo(person, field('openings.0.y'), 135, 'ArrowUp', 'ArrowDown');

      // The tweeter: dragged up on the front to 285 mm; a length typed with its unit is taken as written.
      await person.click(palette('Driver'));
      await person.typeInto(field('openings.1.diameter'), '75 mm');
      await person.typeInto(field('openings.1.displacementLitres'), '0.05');
      await person.click(studio.getByTestId('toggle-openings.1.rebate'));
      await person.typeInto(field('openings.1.rebate.diameter'), '104');
      await person.typeInto(field('openings.1.rebate.depth'), '4');
      const tweeter = await pagePoint(page, target, 'front', 110, 180);
      await person.drag(tweeter, 0, -105 * tweeter.zoom);
      await nudgeTo(person, field('openings.1.y'), 285, 'ArrowUp', 'ArrowDown');

      // The rear port: round tube, 120 mm long, aimed at 55 Hz.
      await person.click(palette('Round port'));
      await person.typeInto(field('openings.2.diameter'), '50');
      await person.typeInto(field('openings.2.wall'), '3');
      await person.typeInto(field('openings.2.length'), '120');
      await person.typeInto(field('openings.2.targetHz'), '55');
      await nudgeTo(person, field('openings.2.y'), 90, 'ArrowUp', 'ArrowDown');

      // The terminal on the back, nudged with the arrow keys to 290 mm (the palette button keeps the focus).
      await person.click(palette('Terminal'));
      await nudgeTo(person, field('openings.3.y'), 290, 'ArrowUp', 'ArrowDown');
      await person.typeInto(field('openings.3.width'), '60');
      await person.typeInto(field('openings.3.height'), '60');

      // The sheet's density (for weights) in the side form; the lining keeps the plain defaults a new design has.
      const density = page.getByLabel('Density', { exact: true });
      await person.click(density);
      await person.press('Control+A');
      person.keys += 3;
      await page.keyboard.type('750');
      await ctx.screenshot('studio-build-before-save');

      await person.press('Control+s');
      await page.getByTestId('save-status').getByText('All changes saved').waitFor();
      const elapsedMs = Date.now() - started;
      await ctx.screenshot('studio-build-saved');

      const m = /\/w\/(\d+)\/designs\/(\d+)$/.exec(new URL(page.url()).pathname);
      expect(m, `not on a design page: ${page.url()}`);
      const api = await ctx.api(DEMO.designer);
      const url = `/api/workshops/${m[1]}/designs/${m[2]}`;
      const saved = (await (await api.get(url)).json()) as { design: unknown };
      const planRes = await api.get(`${url}/plan`);
      expect(planRes.ok(), `GET …/plan should answer 200, got ${planRes.status()}`);
      const plan = (await planRes.json()) as Plan;
      const want = reference.plan;

      const designDiff = firstDifference({ ...designSchema.parse(saved.design), name: target.name }, target, 'design', 1e-9);
      expect(designDiff === null, `the saved design should be the demo bookshelf; first difference ${designDiff}`);
      const panelsDiff = firstDifference(plan.panels, want.panels, 'panels', 1e-6);
      expect(panelsDiff === null, `the panels should be the demo's; first difference ${panelsDiff}`);
      const liningDiff = firstDifference(plan.liningPieces, want.liningPieces, 'liningPieces', 1e-6);
      expect(liningDiff === null, `the lining pieces should be the demo's; first difference ${liningDiff}`);
      expect(Math.abs(plan.volumes.netLitres - want.volumes.netLitres) <= 0.1, `net ${plan.volumes.netLitres} L, the demo plans ${want.volumes.netLitres} L`);
      expect(plan.port && want.port && Math.abs(plan.port.tuningHz - want.port.tuningHz) <= 0.5, `tuning ${plan.port?.tuningHz} Hz, the demo plans ${want.port?.tuningHz} Hz`);
      // The studio's live figures agree with the server's plan of the saved design.
      const net = Number(await page.getByTestId('fig-net').getAttribute('data-value'));
      expect(Math.abs(net - plan.volumes.netLitres) < 1e-9, `the studio shows ${net} L net, the server plans ${plan.volumes.netLitres} L`);

      console.log(
        `    blank design → demo bookshelf saved in ${(elapsedMs / 1000).toFixed(1)} s ` +
          `(${person.clicks} clicks, ${person.drags} drags, ${person.keys} key presses); ` +
          `net ${plan.volumes.netLitres.toFixed(2)} L, tuning ${plan.port?.tuningHz.toFixed(1)} Hz, ${plan.panels.length} panels, ${plan.liningPieces.length} lining pieces`,
      );
    },
  },
];

export default tests;
