import { DEMO_BOOKSHELF, DEMO_FLOORSTANDER } from '../shared/demo/designs.js';
import { ROLES, type Role } from '../shared/schemas/api.schema.js';
import type { Orm } from './db.js';
import { hashPassword } from './modules/auth/password.js';
import { User } from './modules/auth/user.entity.js';
import { DesignsService } from './modules/designs/designs.service.js';
import { Membership } from './modules/workshops/membership.entity.js';
import { Workshop } from './modules/workshops/workshop.entity.js';

/** The invented demo of PRODUCT.md §9. Printed by `npm start`; never seeded when NODE_ENV=production. */
export const DEMO_WORKSHOP = 'Harbour Lane Audio';
export const DEMO_PASSWORD = 'boxwright-demo';
export const DEMO_EMAILS = {
  owner: 'owner@harbourlane.test',
  designer: 'designer@harbourlane.test',
  maker: 'maker@harbourlane.test',
  viewer: 'viewer@harbourlane.test',
} as const satisfies Record<Role, string>;
export const DEMO_PEOPLE: ReadonlyArray<{ email: string; role: Role }> = ROLES.map((role) => ({ role, email: DEMO_EMAILS[role] }));

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
    for (const design of [DEMO_BOOKSHELF, DEMO_FLOORSTANDER]) await designs.create(workshop.id, design, DEMO_EMAILS.designer);
    return true;
  });
}
