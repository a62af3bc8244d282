import type { NestJobDto } from '../../../../shared/schemas/api.schema';
import { Button } from '../../../components/ui/button';

const STATUS_WORDS: Record<NestJobDto['status'], string> = {
  queued: 'Waiting to start (another plan is being worked out)…',
  running: 'Laying out the parts…',
  done: 'Done',
  failed: 'Stopped with an error',
  cancelled: 'Cancelled',
};

/** A nest job's progress bar, what it is doing, and Cancel while it runs. */
export function NestProgress({ job, onCancel, cancelling }: { job: NestJobDto; onCancel?: () => void; cancelling?: boolean }) {
  const percent = Math.round(job.progress * 100);
  const running = job.status === 'queued' || job.status === 'running';
  return (
    <div className="space-y-2" data-testid="nest-progress">
      <div className="flex items-baseline justify-between gap-4 text-sm">
        <span className="font-bold text-zinc-800">{STATUS_WORDS[job.status]}</span>
        <span className="tabular-nums text-zinc-500">
          {running && job.bestSheets > 0 ? `best so far: ${job.bestSheets} sheet${job.bestSheets === 1 ? '' : 's'} · ` : ''}
          {percent} %
        </span>
      </div>
      <div
        role="progressbar"
        aria-label="Cut plan progress"
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={percent}
        className="h-2.5 overflow-hidden rounded-full bg-zinc-100"
      >
        <div
          className={`h-full rounded-full transition-[width] duration-300 ${job.status === 'failed' ? 'bg-red-600' : job.status === 'cancelled' ? 'bg-zinc-400' : 'bg-accent-600'}`}
          style={{ width: `${Math.max(2, percent)}%` }}
        />
      </div>
      {running && onCancel ? (
        <div className="flex justify-end">
          <Button size="sm" onClick={onCancel} busy={cancelling}>
            Cancel
          </Button>
        </div>
      ) : null}
    </div>
  );
}
