import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { CURRENCIES, cutDefaultsInput, workshopNameSchema, type WorkshopDto, type WorkshopUpdateInput } from '../../../../shared/schemas/api.schema';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { Card } from '../../../components/ui/card';
import { Field, Input, Select } from '../../../components/ui/field';
import { isApiError } from '../../../lib/api-client';
import { applyApiError } from '../../../lib/form-errors';
import { CutSettingsFields } from '../../../components/cut-plan/cut-settings-fields';
import { useUpdateWorkshop } from '../api/workshop-settings';
import { currencyLabel } from '../currency';

/**
 * The form: the name, the currency ('' = none) and the default cut settings with the search time in seconds.
 * The cut settings are checked by the cut plan schema itself (`cutDefaultsInput`), the time after turning it into ms.
 */
const formSchema = cutDefaultsInput
  .omit({ timeLimitMs: true })
  .extend({
    name: workshopNameSchema,
    currency: z.union([z.literal(''), z.enum(CURRENCIES)]),
    timeLimitS: z.number({ error: 'search time must be a number (s)' }),
  })
  .superRefine((v, ctx) => {
    const ms = cutDefaultsInput.shape.timeLimitMs.safeParse(Math.round(v.timeLimitS * 1000));
    if (!ms.success) ctx.addIssue({ code: 'custom', path: ['timeLimitS'], message: ms.error.issues[0]?.message ?? 'not a valid search time' });
  });
type FormInput = z.input<typeof formSchema>;
type FormValues = z.output<typeof formSchema>;

function toForm(w: WorkshopDto): FormInput {
  const d = w.cutDefaults;
  return { name: w.name, currency: w.currency ?? '', kerfMm: d.kerfMm, trimMm: d.trimMm, minOffcutMm: d.minOffcutMm, mode: d.mode, timeLimitS: d.timeLimitMs / 1000 };
}

function toBody(v: FormValues, version: number): WorkshopUpdateInput {
  return {
    version,
    name: v.name,
    currency: v.currency === '' ? null : v.currency,
    cutDefaults: { kerfMm: v.kerfMm, trimMm: v.trimMm, minOffcutMm: v.minOffcutMm, mode: v.mode, timeLimitMs: Math.round(v.timeLimitS * 1000) },
  };
}

/**
 * The owner's settings: the workshop's name and currency, and the cut settings "Make cut plan" starts from.
 * Saved together with the loaded version; if someone saved in between (409) the owner loads theirs or keeps these.
 */
export function WorkshopSettingsForm({ workshop, onSaved, onConflict }: { workshop: WorkshopDto; onSaved: (w: WorkshopDto) => void; onConflict: () => Promise<WorkshopDto | undefined> }) {
  const update = useUpdateWorkshop(workshop.id);
  const [conflict, setConflict] = useState<WorkshopDto | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    reset,
    watch,
    formState: { errors, isDirty },
  } = useForm<FormInput, unknown, FormValues>({ resolver: zodResolver(formSchema), defaultValues: toForm(workshop) });

  const save = async (values: FormValues, version: number) => {
    try {
      const saved = await update.mutateAsync(toBody(values, version));
      setConflict(null);
      reset(toForm(saved));
      onSaved(saved);
    } catch (error) {
      if (isApiError(error) && error.isConflict) {
        setConflict((await onConflict()) ?? null);
        return;
      }
      const messages = applyApiError(error, setError, { stripPrefix: 'cutDefaults' });
      const time = messages.find((m) => m.formPath === 'timeLimitMs');
      if (time) setError('timeLimitS', { type: 'server', message: time.message });
    }
  };
  const onSubmit = handleSubmit((values) => save(values, conflict?.version ?? workshop.version));

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-6" aria-label="Workshop settings">
      {conflict ? (
        <Alert
          tone="warning"
          title="Someone else saved these settings since you opened the page"
          actions={
            <>
              <Button
                onClick={() => {
                  reset(toForm(conflict));
                  setConflict(null);
                }}
              >
                Load their version
              </Button>
              <Button variant="primary" busy={update.isPending} onClick={() => handleSubmit((values) => save(values, conflict.version))()}>
                Keep mine (overwrite)
              </Button>
            </>
          }
        >
          Their version is named “{conflict.name}”. Load it to start from their settings, or keep yours to save over them.
        </Alert>
      ) : null}
      {errors.root?.server ? <Alert tone="error">{errors.root.server.message}</Alert> : null}

      <Card title="Workshop" description="The name everyone in the workshop sees, and the currency of the prices in the stock room.">
        <div className="grid gap-4 sm:grid-cols-2">
          <Field label="Name" error={errors.name?.message}>
            {(p) => <Input id={p.id} invalid={p.invalid} aria-describedby={p.describedBy} maxLength={120} {...register('name')} />}
          </Field>
          <Field label="Currency" error={errors.currency?.message} hint="Shown after prices and costs: stock room, cut plans (shared links too), printed cut diagrams.">
            {(p) => (
              <Select id={p.id} invalid={p.invalid} aria-describedby={p.describedBy} {...register('currency')}>
                <option value="">None (plain numbers)</option>
                {CURRENCIES.map((c) => (
                  <option key={c} value={c}>
                    {currencyLabel(c)}
                  </option>
                ))}
              </Select>
            )}
          </Field>
        </div>
      </Card>

      <Card title="Default cut settings" description="“Make cut plan” starts from these; each cut plan can still change them.">
        <div className="grid grid-cols-2 gap-4 sm:grid-cols-3">
          <CutSettingsFields register={register} errors={errors} mode={watch('mode')} />
        </div>
      </Card>

      <div className="flex items-center justify-end gap-3">
        <span className="mr-auto text-sm text-zinc-500" data-testid="settings-status">
          {isDirty ? 'Unsaved changes' : 'All changes saved'}
        </span>
        <Button onClick={() => reset(toForm(workshop))} disabled={!isDirty || update.isPending}>
          Discard
        </Button>
        <Button type="submit" variant="primary" busy={update.isPending} disabled={!isDirty && !conflict}>
          Save settings
        </Button>
      </div>
    </form>
  );
}
