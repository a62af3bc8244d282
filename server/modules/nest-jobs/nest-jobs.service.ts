/**
 * Nest jobs: held in memory while they run (and for an hour after), run in the worker pool, with progress
 * from the worker. A build's job becomes a saved cut plan when it finishes; a raw job only returns its
 * layout. Cancelling a queued job drops it; a running one is asked to stop (Atomics flag) and, if it has
 * not stopped within CANCEL_GRACE_MS, its thread is ended.
 */
import { randomUUID } from 'node:crypto';
import type { EntityManager } from '@mikro-orm/sqlite';
import { ERROR_CODES } from '../../../shared/errors.js';
import { parseNestJob } from '../../../shared/nesting/index.js';
import { nestJobCreateInput, type NestJobDto, type NestJobStatus } from '../../../shared/schemas/api.schema.js';
import type { Layout, NestJob } from '../../../shared/schemas/nest.schema.js';
import { AppError } from '../../errors.js';
import type { Logger } from '../../middleware/error-handler.js';
import { runNest, type NestRun } from '../../workers/pool.js';
import type { NestTaskMessage } from '../../workers/nest.worker.js';
import type { CutPlansService, PreparedCutPlan } from '../cut-plans/cut-plans.service.js';

/** Unfinished jobs one workshop may have at once. */
export const MAX_ACTIVE_JOBS_PER_WORKSHOP = 4;
/** Finished jobs are forgotten after this long (their cut plans stay saved). */
export const KEEP_FINISHED_MS = 60 * 60 * 1000;
export const CANCEL_GRACE_MS = 5000;

interface JobRecord {
  id: string;
  workshopId: number;
  buildId: number | null;
  byEmail: string;
  status: NestJobStatus;
  progress: number;
  bestSheets: number;
  message: string;
  createdAt: Date;
  finishedAt: Date | null;
  error: { code: string; message: string } | null;
  result: NestJobDto['result'];
  run: NestRun | null;
  started: boolean;
}

const FINISHED: ReadonlySet<NestJobStatus> = new Set(['done', 'failed', 'cancelled']);

function toDto(r: JobRecord): NestJobDto {
  return {
    id: r.id,
    status: r.status,
    progress: Math.round(r.progress * 1000) / 1000,
    bestSheets: r.bestSheets,
    message: r.message,
    buildId: r.buildId,
    createdAt: r.createdAt.toISOString(),
    finishedAt: r.finishedAt?.toISOString() ?? null,
    error: r.error,
    result: r.result,
  };
}

export class NestJobsService {
  private readonly jobs = new Map<string, JobRecord>();

  constructor(
    /** The global em: its forks save finished plans outside any request. */
    private readonly em: EntityManager,
    private readonly cutPlans: CutPlansService,
    private readonly logger: Logger = console,
  ) {}

  async create(workshopId: number, input: unknown, byEmail: string): Promise<NestJobDto> {
    this.sweep();
    const body = nestJobCreateInput.parse(input);
    let jobs: NestJob[];
    let prepared: PreparedCutPlan | null = null;
    if (body.buildId !== undefined) {
      prepared = await this.cutPlans.prepare(workshopId, body.buildId, body.settings);
      jobs = prepared.groups.flatMap((g) => (g.job ? [g.job] : []));
    } else {
      const parsed = parseNestJob(body.job);
      if (!parsed.ok) {
        const fields = Object.fromEntries(Object.entries(parsed.fields).map(([k, v]) => [k === '(root)' ? 'job' : `job.${k}`, v]));
        throw AppError.invalid(`job.${parsed.message}`, fields);
      }
      jobs = [parsed.job];
    }
    const active = [...this.jobs.values()].filter((j) => j.workshopId === workshopId && !FINISHED.has(j.status)).length;
    if (active >= MAX_ACTIVE_JOBS_PER_WORKSHOP) {
      throw new AppError(429, ERROR_CODES.rateLimited, `This workshop already has ${active} nest jobs running or waiting; wait for one to finish or cancel one.`);
    }
    const record: JobRecord = {
      id: randomUUID(),
      workshopId,
      buildId: body.buildId ?? null,
      byEmail,
      status: 'queued',
      progress: 0,
      bestSheets: 0,
      message: 'waiting for a free worker',
      createdAt: new Date(),
      finishedAt: null,
      error: null,
      result: null,
      run: null,
      started: false,
    };
    this.jobs.set(record.id, record);
    if (jobs.length === 0) {
      // Nothing fits any stock: no search to run, the plan is saved as it is.
      void this.finish(record, prepared, []);
    } else {
      record.run = runNest(jobs, (m) => this.onMessage(record, m));
      record.run.done.then(
        (r) => this.finish(record, prepared, r.layouts),
        (err: unknown) => this.fail(record, err),
      );
    }
    return toDto(record);
  }

  get(workshopId: number, id: string): NestJobDto {
    return toDto(this.find(workshopId, id));
  }

  cancel(workshopId: number, id: string): NestJobDto {
    const r = this.find(workshopId, id);
    if (FINISHED.has(r.status)) return toDto(r);
    r.status = 'cancelled';
    r.message = 'cancelled';
    r.finishedAt = new Date();
    if (!r.started) r.run?.abort();
    else {
      r.run?.stop();
      const run = r.run;
      const timer = setTimeout(() => run?.abort(), CANCEL_GRACE_MS);
      timer.unref();
      run?.done.finally(() => clearTimeout(timer)).catch(() => {});
    }
    return toDto(r);
  }

  /**
   * Cancels every queued or running job of one workshop (before the workshop is deleted, so none tries to save
   * a plan into it); returns how many were cancelled. They read back as cancelled until forgotten.
   */
  cancelForWorkshop(workshopId: number): number {
    let n = 0;
    for (const r of this.jobs.values()) {
      if (r.workshopId !== workshopId || FINISHED.has(r.status)) continue;
      this.cancel(workshopId, r.id);
      n++;
    }
    return n;
  }

  /** Running or queued jobs (for shutdown and tests). */
  activeCount(): number {
    return [...this.jobs.values()].filter((j) => !FINISHED.has(j.status)).length;
  }

  private find(workshopId: number, id: string): JobRecord {
    const r = this.jobs.get(id);
    // Another workshop's job is "not found", like an unknown id.
    if (!r || r.workshopId !== workshopId) throw AppError.notFound('No such nest job (finished jobs are kept for an hour).');
    return r;
  }

  private onMessage(r: JobRecord, m: NestTaskMessage): void {
    if (FINISHED.has(r.status)) return;
    if (m.type === 'started') {
      r.started = true;
      r.status = 'running';
      r.message = 'searching';
      return;
    }
    r.progress = Math.max(r.progress, Math.min(0.99, m.fraction));
    r.bestSheets = m.bestSheets;
    r.message = m.message === 'improved' ? `best so far: ${m.bestSheets} sheet${m.bestSheets === 1 ? '' : 's'}` : 'searching';
  }

  private async finish(r: JobRecord, prepared: PreparedCutPlan | null, layouts: Layout[]): Promise<void> {
    if (r.status === 'cancelled') return;
    try {
      let cutPlanId: number | null = null;
      let all = layouts;
      if (prepared) {
        const saved = await this.cutPlans.save(this.em.fork(), prepared, layouts, r.byEmail);
        cutPlanId = saved.id;
        all = saved.layouts;
      }
      if (r.status !== 'queued' && r.status !== 'running') return;
      r.result = { cutPlanId, layouts: all };
      r.status = 'done';
      r.progress = 1;
      r.bestSheets = all.reduce((n, l) => n + l.stats.sheetsUsed, 0);
      r.message = 'done';
      r.finishedAt = new Date();
    } catch (err) {
      this.fail(r, err);
    }
  }

  private fail(r: JobRecord, err: unknown): void {
    if (r.status === 'cancelled') return;
    this.logger.error(`[nest job ${r.id}]`, err instanceof Error ? (err.stack ?? err.message) : err);
    r.status = 'failed';
    r.message = 'failed';
    r.error = { code: ERROR_CODES.internal, message: 'The nesting stopped with an error. Try again; if it happens again, try fewer parts or other settings.' };
    r.finishedAt = new Date();
  }

  private sweep(): void {
    const now = Date.now();
    for (const [id, r] of this.jobs) if (r.finishedAt && now - r.finishedAt.getTime() > KEEP_FINISHED_MS) this.jobs.delete(id);
  }
}
