import type { EntityManager } from '@mikro-orm/sqlite';
import type { AuditEventDto } from '../../../shared/schemas/api.schema.js';
import { AuditEvent } from './audit.entity.js';

export interface AuditEntry {
  workshopId: number;
  subjectType: string;
  subjectId: number;
  action: string;
  summary: string;
  actorEmail: string;
}

function toDto(e: AuditEvent): AuditEventDto {
  return {
    id: e.id,
    subjectType: e.subjectType,
    subjectId: e.subjectId,
    action: e.action,
    summary: e.summary.length > 300 ? e.summary.slice(0, 300) : e.summary,
    actorEmail: e.actorEmail,
    at: e.at.toISOString(),
  };
}

/**
 * Persists an audit event with the caller's next flush (no flush here), so the change and its record are
 * written together or not at all. Call it from services, with the em the change uses.
 */
export function recordAudit(em: EntityManager, entry: AuditEntry): void {
  em.create(AuditEvent, {
    workshop: entry.workshopId,
    subjectType: entry.subjectType,
    subjectId: entry.subjectId,
    action: entry.action,
    summary: entry.summary.slice(0, 300),
    actorEmail: entry.actorEmail,
  });
}

/** Reads the history of one item of a workshop, newest first. */
export class AuditService {
  constructor(private readonly em: EntityManager) {}

  async history(workshopId: number, subjectType: string, subjectId: number, limit = 50): Promise<AuditEventDto[]> {
    const events = await this.em.find(
      AuditEvent,
      { workshop: workshopId, subjectType, subjectId },
      { orderBy: { at: 'desc', id: 'desc' }, limit },
    );
    return events.map(toDto);
  }
}
