import type { EntityManager } from '@mikro-orm/sqlite';
import { shareLinkInput, type Currency, type ShareLinkDto, type SharedPlanDto } from '../../../shared/schemas/api.schema.js';
import { AppError } from '../../errors.js';
import { EXPORT_KINDS } from '../../export/cut-plan-exports.js';
import { linkTo, type PublicUrl } from '../../mail/links.js';
import { DAY_MS, hashLinkToken, isLinkTokenShape, newLinkToken } from '../../mail/tokens.js';
import { recordAudit } from '../audit/audit.service.js';
import { CutPlan } from '../cut-plans/cut-plan.entity.js';
import type { CutPlanExportSource, CutPlansService } from '../cut-plans/cut-plans.service.js';
import type { MailService } from '../mail/mail.service.js';
import { Workshop } from '../workshops/workshop.entity.js';
import { ShareLink } from './share-link.entity.js';

function statusOf(l: ShareLink, now: Date): ShareLinkDto['status'] {
  if (l.revokedAt) return 'revoked';
  return l.expiresAt.getTime() <= now.getTime() ? 'expired' : 'active';
}

function toDto(l: ShareLink, now: Date): ShareLinkDto {
  return {
    id: l.id,
    planId: l.cutPlan.id,
    status: statusOf(l, now),
    expiresAt: l.expiresAt.toISOString(),
    sentTo: l.sentTo ?? null,
    createdBy: l.createdBy,
    createdAt: l.createdAt.toISOString(),
    lastOpenedAt: l.lastOpenedAt ? l.lastOpenedAt.toISOString() : null,
    openCount: l.openCount,
  };
}

/** Read-only, expiring, revocable links to one cut plan and its exports, and "send this cut plan" by e-mail. */
export class ShareLinksService {
  constructor(
    private readonly em: EntityManager,
    private readonly cutPlans: CutPlansService,
    private readonly mail: MailService,
    private readonly publicUrl: PublicUrl,
    private readonly now: () => Date = () => new Date(),
  ) {}

  async list(workshopId: number, planId: number): Promise<ShareLinkDto[]> {
    await this.em.findOneOrFail(CutPlan, { id: planId, workshop: workshopId }, { fields: ['id'] });
    const now = this.now();
    const rows = await this.em.find(ShareLink, { workshop: workshopId, cutPlan: planId }, { orderBy: { createdAt: 'desc', id: 'desc' } });
    return rows.map((r) => toDto(r, now));
  }

  /** Makes a link (shown once in the answer) and, with `email`, sends it. */
  async create(workshopId: number, planId: number, input: unknown, byEmail: string): Promise<ShareLinkDto> {
    const { days, email, message } = shareLinkInput.parse(input ?? {});
    const em = this.em.fork();
    const plan = await em.findOneOrFail(CutPlan, { id: planId, workshop: workshopId }, { fields: ['id', 'buildName'] });
    const workshop = await em.findOneOrFail(Workshop, { id: workshopId });
    const now = this.now();
    const { token, hash } = newLinkToken();
    const link = em.create(ShareLink, {
      workshop: workshopId,
      cutPlan: planId,
      tokenHash: hash,
      expiresAt: new Date(now.getTime() + days * DAY_MS),
      sentTo: email ?? null,
      createdBy: byEmail,
    });
    await em.flush();
    recordAudit(em, {
      workshopId,
      subjectType: 'plan',
      subjectId: planId,
      action: 'share',
      summary: `Made a read-only link for ${days} day${days === 1 ? '' : 's'}${email ? `, sent to ${email}` : ''}`,
      actorEmail: byEmail,
    });
    await em.flush();
    const url = linkTo(this.publicUrl, `/share/${token}`);
    let mailSent: boolean | undefined;
    if (email) {
      const lines = [
        `${byEmail} of ${workshop.name} sends you the cut plan "${plan.buildName}" made with Boxwright.`,
        ...(message ? ['', message] : []),
        '',
        `Open it here (read-only; the cut diagrams, cut list, DXF and stencils can be downloaded there). The link works until ${link.expiresAt.toISOString().slice(0, 10)}:`,
        url,
        '',
        'Cutting MDF and other boards makes fine dust: cut with dust extraction and wear a suitable mask, and follow your local rules and the tool maker\'s instructions.',
      ];
      mailSent = (await this.mail.send(workshopId, { kind: 'share-link', to: email, subject: `Cut plan "${plan.buildName}" from ${workshop.name}`, text: lines.join('\n') })).sent;
    }
    return { ...toDto(link, now), url, ...(mailSent !== undefined ? { mailSent } : {}) };
  }

  async revoke(workshopId: number, planId: number, id: number, byEmail: string): Promise<void> {
    const link = await this.em.findOneOrFail(ShareLink, { id, workshop: workshopId, cutPlan: planId });
    if (link.revokedAt) return;
    link.revokedAt = this.now();
    recordAudit(this.em, { workshopId, subjectType: 'plan', subjectId: planId, action: 'unshare', summary: `Withdrew read-only link ${id}`, actorEmail: byEmail });
    await this.em.flush();
  }

  /** The plan a token opens, as a read-only view. Unknown tokens 404; expired or withdrawn ones 410. */
  async open(token: string): Promise<SharedPlanDto> {
    const link = await this.usable(token);
    const plan = await this.em.findOneOrFail(CutPlan, { id: link.cutPlan.id, workshop: link.workshop.id }, { exclude: ['exportCabinets'] });
    // Only the currency code of the workshop: its name and people stay hidden.
    const workshop = await this.em.findOneOrFail(Workshop, { id: link.workshop.id }, { fields: ['currency'] });
    await this.em.fork().nativeUpdate(ShareLink, { id: link.id }, { lastOpenedAt: this.now(), openCount: link.openCount + 1 });
    return {
      buildName: plan.buildName,
      createdAt: plan.createdAt.toISOString(),
      expiresAt: link.expiresAt.toISOString(),
      mode: plan.mode as SharedPlanDto['mode'],
      settings: { kerfMm: plan.settings.kerfMm, trimMm: plan.settings.trimMm, mode: plan.settings.mode, minOffcutMm: plan.settings.minOffcutMm },
      totals: plan.totals,
      cabinets: plan.cabinets.map((c) => ({ ...c, designId: 0 })),
      parts: plan.parts,
      groups: plan.groups,
      warnings: plan.warnings.map((w) => ({ code: w.code, message: w.message })),
      exports: [...EXPORT_KINDS],
      currency: (workshop.currency ?? null) as Currency | null,
    };
  }

  /** The export source of the one plan a token opens. */
  async exportSource(token: string): Promise<CutPlanExportSource> {
    const link = await this.usable(token);
    return this.cutPlans.exportSource(link.workshop.id, link.cutPlan.id);
  }

  private async usable(token: string): Promise<ShareLink> {
    if (!isLinkTokenShape(token)) throw AppError.notFound('This link is not valid.');
    const link = await this.em.findOne(ShareLink, { tokenHash: hashLinkToken(token) });
    if (!link) throw AppError.notFound('This link is not valid.');
    if (link.revokedAt) throw new AppError(410, 'link_expired', 'This link was withdrawn by the workshop.');
    if (link.expiresAt.getTime() <= this.now().getTime()) throw new AppError(410, 'link_expired', 'This link has expired. Ask the workshop for a new one.');
    return link;
  }
}
