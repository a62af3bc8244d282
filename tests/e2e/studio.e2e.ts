/**
 * The design studio in the browser: drag a shelf brace and see the lining and the volume follow the cabinet
 * engine exactly; undo; read-only roles cannot drag; a save conflict lists what changed and is resolved.
 * Demo data: PRODUCT.md §9 (invented). Expected values come from planDesign (shared/cabinet) run here in node
 * on the design the studio should then hold, and from the server's own plan for the saved version.
 */
import type { APIRequestContext, Page } from 'playwright-core';
import { planDesign } from '../../shared/cabinet/index';
import { designSchema, type Design } from '../../shared/schemas/design.schema';
import type { Plan } from '../../shared/schemas/plan.types';
import { layoutViews, VIEW_AXES } from '../../src/features/studio/model/views';
import type { ViewName } from '../../src/features/studio/model/types';
import { DEMO, expect, type E2EContext, type E2ETest } from './harness';

const BOOKSHELF = 'Harbour bookshelf (two-way, rear port)';

interface Located {
  workshopId: number;
  designId: number;
  url: string;
  version: number;
  design: Design;
}

async function findBookshelf(api: APIRequestContext): Promise<Located> {
  const me = (await (await api.get('/api/auth/me')).json()) as { memberships: { workshopId: number }[] };
  const workshopId = me.memberships[0]!.workshopId;
  const list = (await (await api.get(`/api/workshops/${workshopId}/designs`)).json()) as { items: { id: number; name: string }[] };
  const item = list.items.find((d) => d.name === BOOKSHELF);
  expect(item, `the demo design "${BOOKSHELF}" should be seeded`);
  const url = `/api/workshops/${workshopId}/designs/${item.id}`;
  const dto = (await (await api.get(url)).json()) as { version: number; design: unknown };
  return { workshopId, designId: item.id, url, version: dto.version, design: designSchema.parse(dto.design) };
}

/** Signs in as `email` in a new tab and opens the demo bookshelf in the studio. */
async function openStudioAs(ctx: E2EContext, email: string): Promise<{ page: Page; api: APIRequestContext; at: Located }> {
  const api = await ctx.api(email);
  const at = await findBookshelf(api);
  const page = await ctx.page();
  await ctx.signIn(page, email);
  await page.goto(`${ctx.baseUrl}/w/${at.workshopId}/designs/${at.designId}`);
  await page.locator('[data-testid=studio-canvas] canvas').first().waitFor({ timeout: 20_000 });
  await page.getByTestId('fig-net').waitFor();
  return { page, api, at };
}

/** Page coordinates of a box point in one of the studio's drawings, from the canvas's camera. */
async function pagePoint(page: Page, design: Design, view: ViewName, coords: { h: number; v: number }) {
  const canvas = page.getByTestId('studio-canvas');
  const box = await canvas.boundingBox();
  expect(box, 'the studio canvas should be on the page');
  const camera = JSON.parse((await canvas.getAttribute('data-camera')) ?? '{}') as { zoom: number; x: number; y: number };
  const l = layoutViews(design).views[view];
  return {
    x: box.x + camera.x + (l.ox + coords.h) * camera.zoom,
    y: box.y + camera.y - (l.oy + coords.v) * camera.zoom,
    zoom: camera.zoom,
  };
}

async function dragBy(page: Page, from: { x: number; y: number }, dxPx: number, dyPx: number): Promise<void> {
  await page.mouse.move(from.x, from.y);
  await page.mouse.down();
  for (let i = 1; i <= 8; i++) await page.mouse.move(from.x + (dxPx * i) / 8, from.y + (dyPx * i) / 8);
  await page.mouse.up();
}

async function netShown(page: Page): Promise<number> {
  return Number(await page.getByTestId('fig-net').getAttribute('data-value'));
}

async function liningShown(page: Page): Promise<Map<string, { width: number; height: number }>> {
  await page.getByRole('tab', { name: 'Lining' }).click();
  await page.getByTestId('lining-piece').first().waitFor();
  const pieces = await page.getByTestId('lining-piece').evaluateAll((els) =>
    els.map((el) => ({ name: el.getAttribute('data-name') ?? '', width: Number(el.getAttribute('data-width')), height: Number(el.getAttribute('data-height')) })),
  );
  await page.getByRole('tab', { name: 'Drawing' }).click();
  return new Map(pieces.map((p) => [p.name, { width: p.width, height: p.height }]));
}

/** Polls a condition for up to 5 s (the form follows the studio after React's next render). */
async function expectSoon(check: () => Promise<boolean>, message: string): Promise<void> {
  for (let i = 0; i < 50; i++) {
    if (await check()) return;
    await new Promise((r) => setTimeout(r, 100));
  }
  expect(false, message);
}

function plannedOrThrow(design: Design): Plan {
  const r = planDesign(design);
  expect(r.ok, `the expected design should plan: ${r.ok ? '' : r.message}`);
  return r.plan;
}

function checkLining(shown: Map<string, { width: number; height: number }>, plan: Plan, when: string): void {
  expect(shown.size === plan.liningPieces.length, `${when}: the lining view shows ${shown.size} pieces, the engine plans ${plan.liningPieces.length}`);
  for (const p of plan.liningPieces) {
    const s = shown.get(p.name);
    expect(s, `${when}: the lining view should show "${p.name}"`);
    expect(Math.abs(s.width - p.width) < 1e-9 && Math.abs(s.height - p.height) < 1e-9, `${when}: "${p.name}" is ${s.width} × ${s.height}, the engine says ${p.width} × ${p.height}`);
  }
}

function sidePieceHeights(plan: Plan): number[] {
  return plan.liningPieces.filter((p) => p.face === 'left').map((p) => p.height).sort((a, b) => a - b);
}

/** A point on the solid part of shelf brace 0 in the side section (clear of its window). */
function braceGrip(design: Design): { h: number; v: number } {
  const b = design.braces[0]!;
  expect(b.type === 'shelf' && b.axis === 'y', 'the demo bookshelf has a horizontal shelf brace first');
  const tf = design.baffleThickness ?? design.material.thickness;
  return { h: tf + 12, v: b.position };
}

const tests: E2ETest[] = [
  {
    name: 'a designer drags the shelf brace up 50 mm: lining and net volume follow the engine; undo restores them',
    timeoutMs: 90_000,
    async run(ctx) {
      const { page, api: designer, at } = await openStudioAs(ctx, DEMO.designer);
      await ctx.screenshot('studio-designer-1280');

      const before = plannedOrThrow(at.design);
      expect(Math.abs((await netShown(page)) - before.volumes.netLitres) < 1e-9, 'the net volume shown should be the engine\'s for the loaded design');
      checkLining(await liningShown(page), before, 'before the drag');

      // Drag brace 0 in the side section straight up by 50 mm of screen distance at the current zoom.
      const grip = await pagePoint(page, at.design, 'side', braceGrip(at.design));
      await dragBy(page, grip, 0, -50 * grip.zoom);
      const b0 = at.design.braces[0]!;
      expect(b0.type === 'shelf', 'brace 0 is a shelf brace');
      const moved: Design = { ...at.design, braces: [{ ...b0, position: b0.position + 50 }, ...at.design.braces.slice(1)] };
      const after = plannedOrThrow(moved);
      await page.getByTestId('field-braces.0.position').waitFor();
      const shownPos = await page.getByTestId('field-braces.0.position').inputValue();
      expect(shownPos === `${(b0.type === 'shelf' ? b0.position : 0) + 50} mm`, `the brace should sit 50 mm higher, the inspector shows ${shownPos}`);
      const net = await netShown(page);
      expect(Math.abs(net - after.volumes.netLitres) < 1e-9, `net volume shown ${net} L, the engine says ${after.volumes.netLitres} L`);
      expect(after.volumes.netLitres !== before.volumes.netLitres, 'moving the brace should change the net volume (lining fibre volume)');
      const shownAfter = await liningShown(page);
      checkLining(shownAfter, after, 'after the drag');
      // Common practice (PRODUCT.md §3): a horizontal brace splits each side lining in two; moving it up 50 mm
      // makes the lower piece 50 mm taller and the upper one 50 mm shorter.
      const hb = sidePieceHeights(before);
      const ha = sidePieceHeights(after);
      expect(ha.length === 2 && hb.length === 2 && Math.abs(ha[1]! - hb[1]! - 50) < 1e-9 && Math.abs(hb[0]! - ha[0]! - 50) < 1e-9, `side lining heights ${hb} → ${ha}`);
      await ctx.screenshot('studio-after-drag-1280');

      // One undo step for the whole drag.
      await page.getByTestId('studio-canvas').focus();
      await page.keyboard.press('Control+z');
      await page.waitForFunction((v) => document.querySelector('[data-testid=fig-net]')?.getAttribute('data-value') === String(v), before.volumes.netLitres);
      checkLining(await liningShown(page), before, 'after undo');
      await page.keyboard.press('Control+Shift+z');
      await page.waitForFunction((v) => document.querySelector('[data-testid=fig-net]')?.getAttribute('data-value') === String(v), after.volumes.netLitres);

      // Saved, the server's plan agrees with what the studio showed.
      await page.getByRole('button', { name: 'Save design' }).click();
      await page.getByTestId('save-status').getByText('All changes saved').waitFor();
      const serverPlan = (await (await designer.get(`${at.url}/plan`)).json()) as Plan;
      expect(Math.abs(serverPlan.volumes.netLitres - (await netShown(page))) < 1e-9, 'the saved design\'s plan should match the studio\'s figures');

      await page.setViewportSize({ width: 1920, height: 1080 });
      await page.getByRole('button', { name: 'Fit' }).click();
      await page.waitForTimeout(200);
      await ctx.screenshot('studio-designer-1920');
      await page.getByRole('tab', { name: 'Lining' }).click();
      await ctx.screenshot('studio-lining-1920');
    },
  },
  {
    name: 'a viewer sees the studio read-only and cannot drag a brace',
    async run(ctx) {
      const { page, at } = await openStudioAs(ctx, DEMO.viewer);
      await page.getByTestId('studio-readonly').waitFor();
      const studio = page.getByTestId('design-studio');
      expect((await studio.getByRole('button', { name: 'Shelf brace', exact: true }).count()) === 0, 'a viewer must not see the palette');
      expect((await studio.getByRole('button', { name: 'Undo', exact: true }).count()) === 0, 'a viewer must not see undo');
      const net0 = await netShown(page);
      const grip = await pagePoint(page, at.design, 'side', braceGrip(at.design));
      await dragBy(page, grip, 0, -50 * grip.zoom);
      await page.keyboard.press('ArrowUp');
      await page.keyboard.press('Delete');
      const pos = page.getByTestId('field-braces.0.position');
      await pos.waitFor();
      const b0 = at.design.braces[0]!;
      const shown = await pos.inputValue();
      expect(shown === `${b0.type === 'shelf' ? b0.position : 0} mm`, `the brace must not move for a viewer; it shows ${shown}`);
      expect(await pos.getAttribute('readonly') !== null, 'the brace position must be read-only for a viewer');
      expect((await netShown(page)) === net0, 'the net volume must not change for a viewer');
      await ctx.screenshot('studio-viewer-1280');
    },
  },
  {
    name: 'a save conflict lists what changed, and "keep mine" resolves it',
    timeoutMs: 90_000,
    async run(ctx) {
      const { page, at } = await openStudioAs(ctx, DEMO.designer);

      // The owner saves a deeper cabinet meanwhile.
      const owner = await ctx.api(DEMO.owner);
      const current = (await (await owner.get(at.url)).json()) as { version: number; design: Design };
      const put = await owner.put(at.url, { data: { version: current.version, design: { ...current.design, outer: { ...current.design.outer, depth: current.design.outer.depth + 20 } } } });
      expect(put.ok(), `the owner's save should pass, got HTTP ${put.status()}`);

      // I nudge the brace up 10 mm with the keyboard (1 mm grid, Shift = ×10) and save.
      const grip = await pagePoint(page, at.design, 'side', braceGrip(at.design));
      await page.mouse.click(grip.x, grip.y);
      await page.keyboard.press('Shift+ArrowUp');
      await page.getByRole('button', { name: 'Save design' }).click();
      const dialog = page.getByRole('alertdialog');
      await dialog.getByText('Someone else saved this design').waitFor();
      const rows = dialog.getByTestId('conflict-changes');
      await rows.getByText('Outer depth').waitFor();
      await rows.getByText('Brace 1 (shelf): position').waitFor();
      await ctx.screenshot('studio-conflict-1280');

      await dialog.getByRole('button', { name: 'Keep mine (overwrite)' }).click();
      await page.getByTestId('save-status').getByText('All changes saved').waitFor();
      const saved = (await (await owner.get(at.url)).json()) as { version: number; design: Design };
      const b = saved.design.braces[0]!;
      const b0 = at.design.braces[0]!;
      expect(b.type === 'shelf' && b0.type === 'shelf' && b.position === b0.position + 10, 'my brace position should be saved');
      expect(saved.design.outer.depth === at.design.outer.depth, 'keeping mine saves my depth over theirs');
    },
  },
  {
    name: 'the side form and the studio stay in step both ways',
    async run(ctx) {
      const { page, at } = await openStudioAs(ctx, DEMO.designer);
      // Form → studio: a typed width reaches the studio's values and its figures.
      const width = page.getByLabel('Width (W)');
      await width.fill(String(at.design.outer.width + 10));
      await width.blur();
      const widened: Design = { ...at.design, outer: { ...at.design.outer, width: at.design.outer.width + 10 } };
      const gross = plannedOrThrow(widened).volumes.grossLitres;
      await page.waitForFunction((v) => document.querySelector('[data-testid=fig-gross]')?.getAttribute('data-value') === String(v), gross);
      const shownWidth = await page.getByTestId('field-outer.width').inputValue();
      expect(shownWidth === `${at.design.outer.width + 10} mm`, `the studio should show the typed width, it shows ${shownWidth}`);

      // Studio → form: a drag ends in the form's brace position.
      const grip = await pagePoint(page, widened, 'side', braceGrip(at.design));
      await dragBy(page, grip, 0, -20 * grip.zoom);
      const b0 = at.design.braces[0]!;
      expect(b0.type === 'shelf', 'brace 0 is a shelf brace');
      const formPos = page.getByTestId('brace').first().getByLabel(/Centre plane/);
      await expectSoon(async () => Number(await formPos.inputValue()) === b0.position + 20, `the form should show the dragged brace at ${b0.position + 20}`);
      // Undo in the studio goes back in the form too.
      await page.getByRole('button', { name: 'Undo', exact: true }).click();
      await expectSoon(async () => Number(await formPos.inputValue()) === b0.position, `after undo the form should show the brace at ${b0.position}`);
    },
  },
];

export default tests;
