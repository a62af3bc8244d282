import { UniqueConstraintViolationException, type EntityManager } from '@mikro-orm/sqlite';
import type { InvitationDto, InvitationInput, InvitationPreviewDto, Role } from '../../../shared/schemas/api.schema.js';
import { invitationInput } from '../../../shared/schemas/api.schema.js';
import { AppError } from '../../errors.js';
import { linkTo, type PublicUrl } from '../../mail/links.js';
import { DAY_MS, hashLinkToken, isLinkTokenShape, newLinkToken } from '../../mail/tokens.js';
import type { SessionUser } from '../../session-user.js';
import { hashPassword } from '../auth/password.js';
import { User } from '../auth/user.entity.js';
import type { MailService } from '../mail/mail.service.js';
import { Membership } from '../workshops/membership.entity.js';
import { Workshop } from '../workshops/workshop.entity.js';
import { Invitation } from './invitation.entity.js';

/** Invitation links work for 7 days (common practice) and once. */
export const INVITATION_TTL_MS = 7 * DAY_MS;

const ROLE_WORDS: Record<Role, string> = {
  owner: 'an owner',
  designer: 'a designer',
  maker: 'a maker',
  viewer: 'a viewer',
};

function statusOf(inv: Invitation, now: Date): InvitationDto['status'] {
  if (inv.acceptedAt) return 'accepted';
  if (inv.revokedAt) return 'revoked';
  if (inv.expiresAt.getTime() <= now.getTime()) return 'expired';
  return 'pending';
}

function toDto(inv: Invitation, now: Date): InvitationDto {
  return {
    id: inv.id,
    email: inv.email,
    role: inv.role,
    status: statusOf(inv, now),
    expiresAt: inv.expiresAt.toISOString(),
    invitedBy: inv.invitedBy,
    createdAt: inv.createdAt.toISOString(),
  };
}

const GONE = (message: string) => new AppError(410, 'link_expired', message);

export class InvitationsService {
  constructor(
    private readonly em: EntityManager,
    private readonly mail: MailService,
    private readonly publicUrl: PublicUrl,
    private readonly now: () => Date = () => new Date(),
  ) {}

  async list(workshopId: number): Promise<InvitationDto[]> {
    const now = this.now();
    const rows = await this.em.find(Invitation, { workshop: workshopId }, { orderBy: { createdAt: 'desc', id: 'desc' }, limit: 200 });
    return rows.map((r) => toDto(r, now));
  }

  /** Saves the invitation (a pending one for the same e-mail is replaced) and e-mails its link. */
  async invite(workshopId: number, input: InvitationInput, by: SessionUser): Promise<InvitationDto> {
    const { email, role } = invitationInput.parse(input);
    const em = this.em.fork();
    const member = await em.findOne(Membership, { workshop: workshopId, user: { email } });
    if (member) throw AppError.invalid('That person is already a member of this workshop.', { email: 'already a member of this workshop' });
    const workshop = await em.findOneOrFail(Workshop, { id: workshopId });
    const now = this.now();
    await em.nativeUpdate(Invitation, { workshop: workshopId, email, acceptedAt: null, revokedAt: null }, { revokedAt: now });
    const { token, hash } = newLinkToken();
    const invitation = em.create(Invitation, {
      workshop: workshopId,
      email,
      role,
      tokenHash: hash,
      expiresAt: new Date(now.getTime() + INVITATION_TTL_MS),
      invitedBy: by.email,
    });
    await em.flush();
    const link = linkTo(this.publicUrl, `/invite/${token}`);
    const { sent } = await this.mail.send(workshopId, {
      kind: 'invitation',
      to: email,
      subject: `You are invited to ${workshop.name} on Boxwright`,
      text: [
        `${by.email} invites you to join the workshop "${workshop.name}" on Boxwright as ${ROLE_WORDS[role]}.`,
        '',
        'Open this link to accept (it works once, for 7 days):',
        link,
        '',
        'If you did not expect this invitation, ignore this e-mail; nothing happens unless the link is opened.',
      ].join('\n'),
    });
    return { ...toDto(invitation, now), mailSent: sent };
  }

  async revoke(workshopId: number, id: number): Promise<void> {
    const inv = await this.em.findOneOrFail(Invitation, { id, workshop: workshopId });
    if (!inv.acceptedAt && !inv.revokedAt) {
      inv.revokedAt = this.now();
      await this.em.flush();
    }
  }

  /** What the link's page shows. Unknown tokens 404; used, revoked or expired ones 410. */
  async preview(token: string): Promise<InvitationPreviewDto> {
    const inv = await this.usable(this.em, token);
    const workshop = await this.em.findOneOrFail(Workshop, { id: inv.workshop.id });
    const accountExists = (await this.em.count(User, { email: inv.email })) > 0;
    return { workshopName: workshop.name, email: inv.email, role: inv.role, accountExists, expiresAt: inv.expiresAt.toISOString() };
  }

  /**
   * Accepts: a new account is created with `password`; an existing account must be the signed-in user.
   * Joins the workshop with the invited role and uses up the link, all in one transaction.
   * Returns the user to sign in.
   */
  async accept(token: string, password: string | undefined, current: SessionUser | undefined): Promise<{ userId: number; workshopId: number }> {
    const passwordHash = password ? await hashPassword(password) : undefined;
    try {
      return await this.em.fork({ clear: true }).transactional(async (em) => {
        const inv = await this.usable(em, token);
        let user = await em.findOne(User, { email: inv.email });
        if (user) {
          if (!current) throw AppError.unauthenticated(`Sign in as ${inv.email} to accept this invitation.`);
          if (current.id !== user.id) throw AppError.forbidden(`This invitation is for ${inv.email}; you are signed in as ${current.email}.`);
        } else {
          if (current && current.email !== inv.email) {
            throw AppError.forbidden(`This invitation is for ${inv.email}; you are signed in as ${current.email}. Sign out first.`);
          }
          if (!passwordHash) throw AppError.invalid('Choose a password for your new account.', { password: 'password is required' });
          user = em.create(User, { email: inv.email, passwordHash });
        }
        const existing = await em.findOne(Membership, { user: user.id ?? -1, workshop: inv.workshop.id });
        if (existing) existing.role = inv.role;
        else em.create(Membership, { user, workshop: inv.workshop.id, role: inv.role });
        await em.flush();
        // Used up with a conditional update, so two requests racing with one link cannot both succeed.
        const used = await em.nativeUpdate(Invitation, { id: inv.id, acceptedAt: null, revokedAt: null }, { acceptedAt: this.now(), acceptedByUserId: user.id });
        if (used !== 1) throw GONE('This invitation has already been used.');
        return { userId: user.id, workshopId: inv.workshop.id };
      });
    } catch (err) {
      if (err instanceof UniqueConstraintViolationException) throw GONE('This invitation was just used.');
      throw err;
    }
  }

  private async usable(em: EntityManager, token: string): Promise<Invitation> {
    if (!isLinkTokenShape(token)) throw AppError.notFound('This invitation link is not valid.');
    const inv = await em.findOne(Invitation, { tokenHash: hashLinkToken(token) });
    if (!inv) throw AppError.notFound('This invitation link is not valid.');
    if (inv.acceptedAt) throw GONE('This invitation has already been used.');
    if (inv.revokedAt) throw GONE('This invitation was withdrawn. Ask the workshop owner for a new one.');
    if (inv.expiresAt.getTime() <= this.now().getTime()) throw GONE('This invitation has expired. Ask the workshop owner for a new one.');
    return inv;
  }
}
