import { raw, UniqueConstraintViolationException, type EntityManager } from '@mikro-orm/sqlite';
import type { MeDto, SignupInput, UnitSystem, UserDto } from '../../../shared/schemas/api.schema.js';
import { AppError } from '../../errors.js';
import type { SessionUser } from '../../session-user.js';
import { Membership } from '../workshops/membership.entity.js';
import { Workshop } from '../workshops/workshop.entity.js';
import { hashPassword, spendVerifyTime, verifyPassword } from './password.js';
import { User } from './user.entity.js';

const EMAIL_TAKEN = { email: 'an account with this e-mail already exists; sign in instead' };

function toSessionUser(user: User): SessionUser {
  return { id: user.id, email: user.email, units: user.units, sessionVersion: user.sessionVersion };
}

function toUserDto(user: User): UserDto {
  return { id: user.id, email: user.email, units: user.units };
}

/**
 * Sets an account's password hash and bumps its session version in one UPDATE, so every session signed in
 * before stops working (auth.passport.ts). Run it in the caller's transaction; returns the new version, which
 * the session making the change (if any) is signed in again with.
 */
export async function setPasswordEndingSessions(em: EntityManager, userId: number, passwordHash: string): Promise<number> {
  const changed = await em.nativeUpdate(User, { id: userId }, { passwordHash, sessionVersion: raw('session_version + 1') });
  if (changed !== 1) throw AppError.notFound('That account no longer exists.');
  const row = await em.findOneOrFail(User, { id: userId }, { fields: ['sessionVersion'], refresh: true });
  return row.sessionVersion;
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

  /**
   * The user behind a session, or null when the account no longer exists or — when `version` is given — its
   * password was set after the session signed in (the session's version is older than the account's).
   */
  async sessionUser(id: number, version?: number): Promise<SessionUser | null> {
    const user = await this.em.findOne(User, { id });
    if (!user || (version !== undefined && user.sessionVersion !== version)) return null;
    return toSessionUser(user);
  }

  async me(userId: number): Promise<MeDto> {
    const user = await this.em.findOneOrFail(User, { id: userId });
    const memberships = await this.em.find(
      Membership,
      { user: userId },
      { populate: ['workshop'], orderBy: { workshop: { name: 'asc', id: 'asc' } } },
    );
    return {
      user: toUserDto(user),
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
