import { UniqueConstraintViolationException, type EntityManager } from '@mikro-orm/sqlite';
import type { MeDto, SignupInput, UnitSystem } from '../../../shared/schemas/api.schema.js';
import { AppError } from '../../errors.js';
import type { SessionUser } from '../../session-user.js';
import { Membership } from '../workshops/membership.entity.js';
import { Workshop } from '../workshops/workshop.entity.js';
import { hashPassword, spendVerifyTime, verifyPassword } from './password.js';
import { User } from './user.entity.js';

const EMAIL_TAKEN = { email: 'an account with this e-mail already exists; sign in instead' };

function toSessionUser(user: User): SessionUser {
  return { id: user.id, email: user.email, units: user.units };
}

/** Accounts: sign-up (a new workshop with the person as owner), credential checks, "me" and preferences. */
export class AuthService {
  /** `em` resolves to the current request's context (RequestContext) when used inside a request. */
  constructor(private readonly em: EntityManager) {}

  /** Creates the user, a workshop and the owner membership in one flush (one transaction). */
  async signup(input: SignupInput): Promise<SessionUser> {
    const em = this.em.fork();
    if (await em.count(User, { email: input.email })) throw AppError.invalid('That e-mail already has an account.', EMAIL_TAKEN);
    const passwordHash = await hashPassword(input.password);
    const user = em.create(User, { email: input.email, passwordHash });
    const workshop = em.create(Workshop, { name: input.workshopName });
    em.create(Membership, { user, workshop, role: 'owner' });
    try {
      await em.flush();
    } catch (err) {
      // Two sign-ups with one e-mail at the same moment: the unique index decides.
      if (err instanceof UniqueConstraintViolationException) throw AppError.invalid('That e-mail already has an account.', EMAIL_TAKEN);
      throw err;
    }
    return toSessionUser(user);
  }

  /** The user for a correct e-mail and password, else null (same time either way). */
  async verifyCredentials(email: string, password: string): Promise<SessionUser | null> {
    const user = await this.em.findOne(User, { email: email.trim().toLowerCase() }, { populate: ['passwordHash'] });
    if (!user) {
      await spendVerifyTime(password);
      return null;
    }
    return (await verifyPassword(user.passwordHash, password)) ? toSessionUser(user) : null;
  }

  /** The user behind a session id, or null when the account no longer exists. */
  async sessionUser(id: number): Promise<SessionUser | null> {
    const user = await this.em.findOne(User, { id });
    return user ? toSessionUser(user) : null;
  }

  async me(userId: number): Promise<MeDto> {
    const user = await this.em.findOneOrFail(User, { id: userId });
    const memberships = await this.em.find(
      Membership,
      { user: userId },
      { populate: ['workshop'], orderBy: { workshop: { name: 'asc', id: 'asc' } } },
    );
    return {
      user: toSessionUser(user),
      memberships: memberships.map((m) => ({ workshopId: m.workshop.id, workshopName: m.workshop.name, role: m.role })),
    };
  }

  async updatePreferences(userId: number, prefs: { units: UnitSystem }): Promise<MeDto> {
    const user = await this.em.findOneOrFail(User, { id: userId });
    user.units = prefs.units;
    await this.em.flush();
    return this.me(userId);
  }
}
