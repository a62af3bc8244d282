/** The demo build of PRODUCT.md §9: a pair of bookshelf cabinets and a batch of four floorstanders. */
import { planDesign } from '../../../shared/cabinet/index.js';
import { DEMO_BOOKSHELF, DEMO_FLOORSTANDER } from '../../../shared/demo/designs.js';
import { buildCabinet, type BuildCabinet } from '../../../shared/render/build.js';
import type { DesignInput } from '../../../shared/schemas/design.schema.js';

function cabinet(design: DesignInput, count: number): BuildCabinet {
  const outcome = planDesign(design);
  if (!outcome.ok) throw new Error(`demo design does not plan: ${outcome.message}`);
  return buildCabinet(outcome.design, outcome.plan, count);
}

export function demoBuild(): BuildCabinet[] {
  return [cabinet(DEMO_BOOKSHELF, 2), cabinet(DEMO_FLOORSTANDER, 4)];
}
