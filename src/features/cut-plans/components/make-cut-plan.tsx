import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect, useMemo, useState } from 'react';
import { useFieldArray, useForm } from 'react-hook-form';
import { z } from 'zod';
import { money } from '../../../../shared/render/cut-diagram';
import { cutPlanSettingsInput, USUAL_CUT_DEFAULTS, type CutDefaults, type CutPlanSettingsInput, type StockInput, type StockItemDto } from '../../../../shared/schemas/api.schema';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { Card } from '../../../components/ui/card';
import { Checkbox, Field, Input, Select } from '../../../components/ui/field';
import { Spinner } from '../../../components/ui/spinner';
import { isApiError } from '../../../lib/api-client';
import { applyApiError } from '../../../lib/form-errors';
import { formatNumber } from '../../../lib/format';
import { numberInput } from '../../../lib/number-input';
import { useStockRoom } from '../api/get-stock-room';
import { isFinished, jobReadProblem, useCancelNestJob, useNestJob, useStartNestJob } from '../api/nest-jobs';
import { CutSettingsFields } from '../../../components/cut-plan/cut-settings-fields';
import { NestProgress } from './nest-progress';

/** The form: settings as the API takes them, the search time in seconds, and whether the stock is typed in. */
const formSchema = cutPlanSettingsInput.omit({ timeLimitMs: true, stockIds: true, typedStock: true, seed: true }).extend({
  timeLimitS: z.number({ error: 'search time must be a number (s)' }).min(0.2, 'at least 0.2 s').max(60, 'at most 60 s'),
  typed: z.boolean(),
  typedStock: cutPlanSettingsInput.shape.typedStock.unwrap().optional(),
});
type FormInput = z.input<typeof formSchema>;

/** Settings with an input of their own in this form (other field errors are shown at the top). */
const FORM_FIELDS = new Set(['kerfMm', 'trimMm', 'mode', 'minOffcutMm', 'typedStock']);

/** Typed-in stock starts as the usual sheet and lining roll (PRODUCT.md §9). */
const TYPED_DEFAULTS: StockInput[] = [
  { kind: 'sheet', material: 'MDF', thicknessMm: 18, widthMm: 2440, heightMm: 1220, lengthMm: null, quantity: null, cost: null, grain: 'none' },
  { kind: 'roll', material: 'Polyester batt', thicknessMm: 50, widthMm: 1200, heightMm: null, lengthMm: null, quantity: null, cost: null, grain: 'none' },
];

function stockLabel(s: StockItemDto): string {
  const size = s.kind === 'roll' ? `${formatNumber(s.widthMm)} mm wide${s.lengthMm ? `, ${formatNumber(s.lengthMm / 1000, 2)} m` : ''}` : `${formatNumber(s.widthMm)} × ${formatNumber(s.heightMm ?? 0)} mm`;
  return `${s.kind === 'roll' ? 'Roll' : s.kind === 'remnant' ? 'Remnant' : 'Sheet'} · ${s.material} ${formatNumber(s.thicknessMm)} mm · ${size}`;
}

function stockExtra(s: StockItemDto, currency?: string | null): string {
  const qty = s.quantity === null ? 'unlimited' : `${s.quantity} in stock`;
  const cost = s.cost === null ? 'no price' : `${money(s.cost, currency)}${s.kind === 'roll' ? ' per m' : ' each'}`;
  return `${qty} · ${cost}${s.grain === 'length' ? ' · grain along the length' : ''}`;
}

/**
 * "Make cut plan": the stock (chosen from the stock room, or typed in when the room is empty or the
 * user prefers), the settings, then the server's nest job with a progress bar and Cancel. The settings start
 * from the workshop's default cut settings (`defaults`, set by an owner) when given; prices show `currency`.
 */
export function MakeCutPlan({
  workshopId,
  buildId,
  canReadStock,
  onDone,
  defaults,
  currency,
}: {
  workshopId: number;
  buildId: number;
  canReadStock: boolean;
  onDone: (cutPlanId: number) => void;
  defaults?: CutDefaults;
  currency?: string | null;
}) {
  const room = useStockRoom(workshopId, canReadStock);
  const start = useStartNestJob(workshopId);
  const cancel = useCancelNestJob(workshopId);
  const [jobId, setJobId] = useState<string | null>(null);
  const job = useNestJob(workshopId, jobId);
  const available = useMemo(() => (room.data ?? []).filter((s) => s.quantity !== 0), [room.data]);
  const [chosen, setChosen] = useState<Set<number> | null>(null);
  const selected = chosen ?? new Set(available.map((s) => s.id));

  // The workshop's default cut settings, else the cut plan schema's own.
  const initial = defaults ?? USUAL_CUT_DEFAULTS;
  const {
    register,
    control,
    handleSubmit,
    setError,
    watch,
    setValue,
    formState: { errors },
  } = useForm<FormInput>({
    resolver: zodResolver(formSchema),
    defaultValues: {
      kerfMm: initial.kerfMm,
      trimMm: initial.trimMm,
      mode: initial.mode,
      minOffcutMm: initial.minOffcutMm,
      objective: 'sheets',
      timeLimitS: initial.timeLimitMs / 1000,
      typed: false,
      typedStock: TYPED_DEFAULTS,
    },
  });
  const typedRows = useFieldArray({ control, name: 'typedStock' });
  const typed = watch('typed');
  const roomEmpty = !canReadStock || (room.isSuccess && available.length === 0);

  useEffect(() => {
    if (roomEmpty) setValue('typed', true);
  }, [roomEmpty, setValue]);

  useEffect(() => {
    const result = job.data?.result;
    if (job.data?.status === 'done' && result?.cutPlanId) onDone(result.cutPlanId);
  }, [job.data, onDone]);

  const problem = jobReadProblem(job.isError ? job.error : null);
  const running = jobId !== null && !isFinished(job.data) && problem !== 'lost';

  const onSubmit = handleSubmit(async (values) => {
    const settings: CutPlanSettingsInput = {
      kerfMm: values.kerfMm,
      trimMm: values.trimMm,
      mode: values.mode,
      minOffcutMm: values.minOffcutMm,
      objective: values.objective,
      timeLimitMs: Math.round(values.timeLimitS * 1000),
      ...(values.typed ? { typedStock: values.typedStock } : { stockIds: [...selected] }),
    };
    if (!values.typed && selected.size === 0) {
      setError('root.server', { type: 'server', message: 'Choose at least one stock item, or type in the stock.' });
      return;
    }
    try {
      const created = await start.mutateAsync({ buildId, settings });
      setJobId(created.id);
    } catch (error) {
      const messages = applyApiError(error, setError, { stripPrefix: 'settings' });
      // Problems of the build itself (a deleted design) or of the stock choice have no input here: say them on top.
      const elsewhere = messages.filter((m) => !FORM_FIELDS.has(m.formPath.split('.')[0]!) || m.formPath.startsWith('stockIds'));
      if (elsewhere.length > 0 && isApiError(error)) setError('root.server', { type: 'server', message: error.message });
    }
  });

  return (
    <Card title="Make cut plan" description="Lay the panels out on sheets and the lining on rolls. The server works it out; you can cancel at any time.">
      <form onSubmit={onSubmit} noValidate className="space-y-5">
        {errors.root?.server ? <Alert tone="error">{errors.root.server.message}</Alert> : null}
        <fieldset className="space-y-2" disabled={running}>
          <legend className="mb-1 text-sm font-bold text-zinc-800">Stock</legend>
          {canReadStock && room.isPending ? <Spinner label="Loading the stock room…" /> : null}
          {canReadStock && room.isError ? <Alert tone="error">Could not load the stock room: {room.error.message}</Alert> : null}
          {!roomEmpty && available.length > 0 ? (
            <Checkbox label="Type in the stock for this plan instead of using the stock room" {...register('typed')} />
          ) : (
            <p className="text-sm text-zinc-600">{canReadStock ? 'The stock room is empty: type in the sheets and rolls to cut from.' : 'Type in the sheets and rolls to cut from.'}</p>
          )}
          {!typed && available.length > 0 ? (
            <ul className="divide-y divide-zinc-100 rounded-lg border border-zinc-200" aria-label="Stock room">
              {available.map((s) => (
                <li key={s.id} className="flex items-center justify-between gap-4 px-3 py-2">
                  <Checkbox
                    label={stockLabel(s)}
                    checked={selected.has(s.id)}
                    onChange={(e) => {
                      const next = new Set(selected);
                      if (e.target.checked) next.add(s.id);
                      else next.delete(s.id);
                      setChosen(next);
                    }}
                  />
                  <span className="text-xs text-zinc-500">{stockExtra(s, currency)}</span>
                </li>
              ))}
            </ul>
          ) : null}
          {typed ? (
            <div className="space-y-2">
              {typedRows.fields.map((field, i) => {
                const e = errors.typedStock?.[i];
                const kind = watch(`typedStock.${i}.kind`);
                return (
                  <div key={field.id} className="grid grid-cols-2 gap-2 rounded-lg border border-zinc-200 p-2 sm:grid-cols-[7rem_1fr_6rem_7rem_7rem_6rem_auto]" data-testid="typed-stock">
                    <Field label="Kind" error={e?.kind?.message}>
                      {({ id }) => (
                        <Select id={id} {...register(`typedStock.${i}.kind`)}>
                          <option value="sheet">Sheet</option>
                          <option value="remnant">Remnant</option>
                          <option value="roll">Roll</option>
                        </Select>
                      )}
                    </Field>
                    <Field label="Material" error={e?.material?.message}>
                      {({ id, invalid }) => <Input id={id} invalid={invalid} {...register(`typedStock.${i}.material`)} />}
                    </Field>
                    <Field label="Thickness" unit="mm" error={e?.thicknessMm?.message}>
                      {({ id, invalid }) => <Input id={id} withUnit invalid={invalid} {...numberInput(register, `typedStock.${i}.thicknessMm`)} />}
                    </Field>
                    <Field label="Width" unit="mm" error={e?.widthMm?.message}>
                      {({ id, invalid }) => <Input id={id} withUnit invalid={invalid} {...numberInput(register, `typedStock.${i}.widthMm`)} />}
                    </Field>
                    {kind === 'roll' ? (
                      <Field label="Length" unit="mm" hint="empty: as needed" error={e?.lengthMm?.message}>
                        {({ id, invalid }) => <Input id={id} withUnit invalid={invalid} {...numberInput(register, `typedStock.${i}.lengthMm`)} />}
                      </Field>
                    ) : (
                      <Field label="Height" unit="mm" error={e?.heightMm?.message}>
                        {({ id, invalid }) => <Input id={id} withUnit invalid={invalid} {...numberInput(register, `typedStock.${i}.heightMm`)} />}
                      </Field>
                    )}
                    <Field label={kind === 'roll' ? 'Cost / m' : 'Cost each'} error={e?.cost?.message}>
                      {({ id, invalid }) => <Input id={id} invalid={invalid} {...numberInput(register, `typedStock.${i}.cost`)} />}
                    </Field>
                    <div className="pt-6">
                      <Button size="sm" variant="ghost" onClick={() => typedRows.remove(i)} disabled={typedRows.fields.length === 1} aria-label={`Remove stock ${i + 1}`}>
                        Remove
                      </Button>
                    </div>
                  </div>
                );
              })}
              <Button size="sm" onClick={() => typedRows.append({ ...TYPED_DEFAULTS[0]! })}>
                Add stock
              </Button>
            </div>
          ) : null}
        </fieldset>

        <fieldset className="grid grid-cols-2 gap-3 sm:grid-cols-5" disabled={running}>
          <legend className="mb-2 text-sm font-bold text-zinc-800">Settings</legend>
          <CutSettingsFields register={register} errors={errors} mode={watch('mode')} />
        </fieldset>

        {job.data && problem !== 'lost' ? (
          <NestProgress job={job.data} cancelling={cancel.isPending} onCancel={() => jobId && cancel.mutate(jobId)} />
        ) : null}
        {problem === 'offline' && running ? (
          <Alert tone="warning" title="Lost contact with the server" actions={<Button onClick={() => job.refetch()} busy={job.isFetching}>Check again</Button>}>
            The cut plan may still be in the works. Check the connection, then check again.
          </Alert>
        ) : null}
        {problem === 'lost' ? (
          <Alert tone="warning" title="This cut plan was not finished">
            The server restarted while it was working on it. Make the cut plan again.
          </Alert>
        ) : null}
        {job.data?.status === 'failed' ? <Alert tone="error">{job.data.error?.message ?? 'The nesting stopped with an error.'}</Alert> : null}
        {job.data?.status === 'done' ? <Alert tone="success">Cut plan ready — opening it…</Alert> : null}

        {running ? null : (
          <div className="flex justify-end">
            <Button type="submit" variant="primary" busy={start.isPending}>
              {(job.data && isFinished(job.data) && job.data.status !== 'done') || problem === 'lost' ? 'Try again' : 'Make cut plan'}
            </Button>
          </div>
        )}
      </form>
    </Card>
  );
}
