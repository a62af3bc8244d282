import { DEMO_BOOKSHELF, DEMO_FLOORSTANDER } from '../shared/demo/designs.js';
import { ROLES, type Role } from '../shared/schemas/api.schema.js';
import type { Orm } from './db.js';
import { hashPassword } from './modules/auth/password.js';
import { User } from './modules/auth/user.entity.js';
import { BuildsService } from './modules/builds/builds.service.js';
import { DesignsService } from './modules/designs/designs.service.js';
import { StockService } from './modules/stock/stock.service.js';
import { Membership } from './modules/workshops/membership.entity.js';
import { Workshop } from './modules/workshops/workshop.entity.js';

/** The invented demo of PRODUCT.md §9. Printed by `npm start`; never seeded when NODE_ENV=production. */
export const DEMO_WORKSHOP = 'Harbour Lane Audio';
export const DEMO_PASSWORD = 'boxwright-demo';
export const DEMO_BUILD_NAME = 'Harbour Lane pair + floorstanders';
export const DEMO_EMAILS = {
  owner: 'owner@harbourlane.test',
  designer: 'designer@harbourlane.test',
  maker: 'maker@harbourlane.test',
  viewer: 'viewer@harbourlane.test',
} as const satisfies Record<Role, string>;
export const DEMO_PEOPLE: ReadonlyArray<{ email: string; role: Role }> = ROLES.map((role) => ({ role, email: DEMO_EMAILS[role] }));

/**
 * The demo stock room (PRODUCT.md §9): 18 mm MDF sheets of 2440 × 1220 mm (MDF has no grain), one kept
 * offcut, 25 mm MDF for the floorstanders' baffles, and 50 mm polyester batt on a 1200 mm roll. Prices are invented.
 */
export const DEMO_STOCK = [
  { kind: 'sheet', material: 'MDF', thicknessMm: 18, widthMm: 2440, heightMm: 1220, quantity: 12, cost: 38.5, grain: 'none', note: 'demo' },
  { kind: 'remnant', material: 'MDF', thicknessMm: 18, widthMm: 1220, heightMm: 610, quantity: 1, cost: 0, grain: 'none', note: 'kept offcut' },
  // The floorstanders' baffles are 25 mm (a thicker front), so a few 25 mm sheets too.
  { kind: 'sheet', material: 'MDF', thicknessMm: 25, widthMm: 2440, heightMm: 1220, quantity: 3, cost: 52, grain: 'none', note: 'for baffles' },
  { kind: 'roll', material: 'Polyester batt', thicknessMm: 50, widthMm: 1200, lengthMm: 12000, quantity: 1, cost: 6.2, grain: 'none', note: 'cost per metre' },
] as const;

/** Whether to seed: only a database that was just created, only when asked, never in production. */
export function shouldSeed(opts: { wasNew: boolean; requested: boolean; nodeEnv: string | undefined }): boolean {
  return opts.wasNew && opts.requested && opts.nodeEnv !== 'production';
}

/**
 * Writes the demo workshop, its four people and the demo designs in one transaction. Does nothing when
 * the database already has any account (a second guard besides `shouldSeed`). Returns whether it seeded.
 */
export async function seedDemo(orm: Orm): Promise<boolean> {
  return orm.em.fork().transactional(async (em) => {
    if ((await em.count(User, {})) > 0) return false;
    const workshop = em.create(Workshop, { name: DEMO_WORKSHOP });
    for (const person of DEMO_PEOPLE) {
      const user = em.create(User, { email: person.email, passwordHash: await hashPassword(DEMO_PASSWORD) });
      em.create(Membership, { user, workshop, role: person.role });
    }
    await em.flush();
    // Through the service, so the demo designs pass the same checks as a user's save.
    const designs = new DesignsService(em);
    const designIds: number[] = [];
    for (const design of [DEMO_BOOKSHELF, DEMO_FLOORSTANDER]) designIds.push((await designs.create(workshop.id, design, DEMO_EMAILS.designer)).id);
    const stock = new StockService(em);
    for (const item of DEMO_STOCK) await stock.create(workshop.id, item, DEMO_EMAILS.maker);
    // The demo build: the bookshelf pair (mirror images) and four floorstanders.
    await new BuildsService(em).create(
      workshop.id,
      {
        name: DEMO_BUILD_NAME,
        items: [
          { designId: designIds[0]!, quantity: 2, mirroredPair: true },
          { designId: designIds[1]!, quantity: 4, mirroredPair: false },
        ],
      },
      DEMO_EMAILS.designer,
    );
    return true;
  });
}
