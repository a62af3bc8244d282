import type { EntityManager } from '@mikro-orm/sqlite';
import { passwordResetInput, passwordResetRequestInput } from '../../../shared/schemas/api.schema.js';
import { AppError } from '../../errors.js';
import { linkTo, type PublicUrl } from '../../mail/links.js';
import { HOUR_MS, hashLinkToken, isLinkTokenShape, newLinkToken } from '../../mail/tokens.js';
import type { Logger } from '../../middleware/error-handler.js';
import { setPasswordEndingSessions } from '../auth/auth.service.js';
import { hashPassword } from '../auth/password.js';
import { User } from '../auth/user.entity.js';
import type { MailService } from '../mail/mail.service.js';
import { PasswordResetToken } from './password-reset-token.entity.js';

/** Reset links work once, for one hour (OWASP Forgot Password Cheat Sheet: short-lived, single-use). */
export const RESET_TTL_MS = HOUR_MS;

export const RESET_REQUEST_ANSWER = 'If an account exists for that e-mail, a link to choose a new password is on its way. It works once, for one hour.';

const GONE = (message: string) => new AppError(410, 'link_expired', message);

export class PasswordResetService {
  constructor(
    private readonly em: EntityManager,
    private readonly mail: MailService,
    private readonly publicUrl: PublicUrl,
    private readonly logger: Logger = console,
    private readonly now: () => Date = () => new Date(),
  ) {}

  /**
   * Starts a reset. The caller answers the same whether or not the account exists, and does not wait for
   * this: the returned promise is for tests (timing does not reveal accounts either).
   */
  request(input: unknown): Promise<void> {
    const { email } = passwordResetRequestInput.parse(input);
    return this.sendLink(email).catch((err: unknown) => this.logger.error('Password reset e-mail failed', err));
  }

  private async sendLink(email: string): Promise<void> {
    const em = this.em.fork();
    const user = await em.findOne(User, { email });
    if (!user) return;
    const { token, hash } = newLinkToken();
    em.create(PasswordResetToken, { user, tokenHash: hash, expiresAt: new Date(this.now().getTime() + RESET_TTL_MS) });
    await em.flush();
    await this.mail.send(null, {
      kind: 'password-reset',
      to: user.email,
      subject: 'Choose a new Boxwright password',
      text: [
        'Someone (we hope you) asked to reset the password of your Boxwright account.',
        '',
        'Open this link to choose a new password (it works once, for one hour):',
        linkTo(this.publicUrl, `/reset-password/${token}`),
        '',
        'If you did not ask for this, ignore this e-mail: your password stays as it is.',
      ].join('\n'),
    });
  }

  /** The account a valid link is for (to show on the page). */
  async check(token: string): Promise<{ email: string }> {
    const row = await this.usable(this.em, token);
    const user = await this.em.findOneOrFail(User, { id: row.user.id });
    return { email: user.email };
  }

  /**
   * Sets the new password, uses up the link (and every other open link of the account) and ends every session
   * of the account, in one transaction. Returns the account and its new session version, so a session of that
   * account making the change can be signed in again.
   */
  async reset(token: string, input: unknown): Promise<{ userId: number; sessionVersion: number }> {
    const { password } = passwordResetInput.parse(input);
    const passwordHash = await hashPassword(password);
    return this.em.fork({ clear: true }).transactional(async (em) => {
      const row = await this.usable(em, token);
      const now = this.now();
      const used = await em.nativeUpdate(PasswordResetToken, { id: row.id, usedAt: null }, { usedAt: now });
      if (used !== 1) throw GONE('This link has already been used.');
      await em.nativeUpdate(PasswordResetToken, { user: row.user.id, usedAt: null }, { usedAt: now });
      const sessionVersion = await setPasswordEndingSessions(em, row.user.id, passwordHash);
      return { userId: row.user.id, sessionVersion };
    });
  }

  private async usable(em: EntityManager, token: string): Promise<PasswordResetToken> {
    if (!isLinkTokenShape(token)) throw AppError.notFound('This password link is not valid.');
    const row = await em.findOne(PasswordResetToken, { tokenHash: hashLinkToken(token) });
    if (!row) throw AppError.notFound('This password link is not valid.');
    if (row.usedAt) throw GONE('This link has already been used. Ask for a new one if you still need it.');
    if (row.expiresAt.getTime() <= this.now().getTime()) throw GONE('This link has expired. Ask for a new one.');
    return row;
  }
}
