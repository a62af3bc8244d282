import type { EntityManager } from '@mikro-orm/sqlite';
import type { MemberDto, Role } from '../../../shared/schemas/api.schema.js';
import { AppError } from '../../errors.js';
import { Membership } from './membership.entity.js';

const LAST_OWNER = 'A workshop needs at least one owner: make someone else owner first.';

function toMemberDto(m: Membership): MemberDto {
  return { userId: m.user.id, email: m.user.email, role: m.role };
}

/** Workshop membership: who belongs to a workshop, with which role. */
export class WorkshopsService {
  constructor(private readonly em: EntityManager) {}

  /** The user's role in the workshop, or null when not a member (or no such workshop). */
  async roleOf(userId: number, workshopId: number): Promise<Role | null> {
    const m = await this.em.findOne(Membership, { user: userId, workshop: workshopId });
    return m?.role ?? null;
  }

  async listMembers(workshopId: number): Promise<MemberDto[]> {
    const members = await this.em.find(Membership, { workshop: workshopId }, { populate: ['user'], orderBy: { user: { email: 'asc' } } });
    return members.map(toMemberDto);
  }

  /** Changes a member's role; the last owner cannot step down. */
  async changeRole(workshopId: number, userId: number, role: Role): Promise<MemberDto> {
    return this.em.transactional(async (em) => {
      const m = await em.findOneOrFail(Membership, { workshop: workshopId, user: userId }, { populate: ['user'] });
      if (m.role === 'owner' && role !== 'owner' && (await this.ownerCount(em, workshopId)) <= 1) {
        throw AppError.invalid(LAST_OWNER, { role: LAST_OWNER });
      }
      m.role = role;
      await em.flush();
      return toMemberDto(m);
    });
  }

  /** Removes a member from the workshop (not the account); the last owner cannot be removed. */
  async removeMember(workshopId: number, userId: number): Promise<void> {
    await this.em.transactional(async (em) => {
      const m = await em.findOneOrFail(Membership, { workshop: workshopId, user: userId });
      if (m.role === 'owner' && (await this.ownerCount(em, workshopId)) <= 1) throw AppError.invalid(LAST_OWNER);
      em.remove(m);
      await em.flush();
    });
  }

  private ownerCount(em: EntityManager, workshopId: number): Promise<number> {
    return em.count(Membership, { workshop: workshopId, role: 'owner' });
  }
}
