/**
 * The SVG cut diagram opens in a common viewer: Debian's chromium, driven by playwright-core, parses it
 * as an SVG document (no XML parser error) and lays it out at its size in mm (96 CSS px per inch,
 * CSS Values and Units Level 3: 1 mm = 96 / 25.4 px).
 */
import { existsSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { chromium } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { cutDiagramSvgs } from '../../../shared/render/cut-diagram.js';
import { SMALL_LAYOUT, SMALL_PARTS, SMALL_STOCK } from './fixtures.js';

const CHROMIUM = '/usr/bin/chromium';
const ARGS = ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'];

describe.skipIf(!existsSync(CHROMIUM))('SVG cut diagram in a browser', () => {
  it('parses as SVG and measures its width in mm', async () => {
    const dir = mkdtempSync(path.join(tmpdir(), 'boxwright-svg-'));
    const context = await chromium.launchPersistentContext(path.join(dir, 'profile'), { executablePath: CHROMIUM, headless: true, args: ARGS });
    try {
      const [first] = cutDiagramSvgs({ title: 'Harbour Lane build', layouts: [SMALL_LAYOUT], parts: SMALL_PARTS, stock: SMALL_STOCK });
      const file = path.join(dir, 'sheet-1.svg');
      writeFileSync(file, first!.svg);
      const page = await context.newPage();
      await page.goto(`file://${file}`);
      const result = await page.evaluate(() => {
        const root = document.documentElement;
        const box = root.getBoundingClientRect();
        return { name: root.nodeName, errors: document.getElementsByTagName('parsererror').length, widthPx: box.width, texts: document.getElementsByTagName('text').length };
      });
      expect(result.name).toBe('svg');
      expect(result.errors).toBe(0);
      const widthMm = Number(first!.svg.match(/width="([\d.]+)mm"/)![1]);
      expect(result.widthPx).toBeCloseTo((widthMm * 96) / 25.4, 0);
      expect(result.texts).toBeGreaterThan(5);
    } finally {
      await context.close();
      rmSync(dir, { recursive: true, force: true });
    }
  });
});
