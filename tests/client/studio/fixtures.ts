/** Parsed demo designs (PRODUCT.md §9, invented) as studio documents. */
import { designSchema } from '../../../shared/schemas/design.schema';
import { DEMO_BOOKSHELF, DEMO_FLOORSTANDER } from '../../../shared/demo/designs';
import type { StudioDoc } from '../../../src/features/studio/model/types';

export const bookshelf = (): StudioDoc => designSchema.parse(DEMO_BOOKSHELF);
export const floorstander = (): StudioDoc => designSchema.parse(DEMO_FLOORSTANDER);
