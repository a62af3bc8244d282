import { zodResolver } from '@hookform/resolvers/zod';
import { useQueryClient } from '@tanstack/react-query';
import { useEffect, useMemo, useRef, useState, type ReactNode } from 'react';
import { FormProvider, useForm, useWatch } from 'react-hook-form';
import type { DesignDto } from '../../../../shared/schemas/api.schema';
import { designSchema, type Design, type DesignInput } from '../../../../shared/schemas/design.schema';
import { LeaveGuard } from '../../../components/leave-guard';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { isApiError } from '../../../lib/api-client';
import { describeFormPath, type FieldMessage } from '../../../lib/field-paths';
import { formatDateTime, formatRelativeTime } from '../../../lib/format';
import { applyApiError } from '../../../lib/form-errors';
import { designQueryOptions } from '../api/get-design';
import { useUpdateDesign } from '../api/update-design';
import { sameDesign } from '../compare';
import { keepFaceCoords } from '../defaults';
import type { LengthUnit } from '../../../../shared/units/index';
import { BoxSection } from './box-section';
import { LengthUnitContext } from './fields';
import { BracesSection } from './braces-section';
import { LiningSection } from './lining-section';
import { OpeningsSection } from './openings-section';
import { PlanSummary } from './plan-summary';

/** What is sent: only the two coordinates each opening's face uses. */
export function designForSave(design: Design): Design {
  return { ...design, openings: design.openings.map(keepFaceCoords) };
}

/** Jump links to the form's sections, with what each holds. */
function SectionLinks({ braces, openings, lined }: { braces: number; openings: number; lined: boolean }) {
  const links = [
    { href: '#box', label: 'Box' },
    { href: '#braces', label: 'Braces', count: braces },
    { href: '#openings', label: 'Openings', count: openings },
    { href: '#lining', label: 'Lining', note: lined ? undefined : 'none' },
  ];
  return (
    <nav aria-label="Sections of the form" className="rounded-xl border border-zinc-200 bg-white px-5 py-3 shadow-xs">
      <p className="mb-1 text-[13px] text-zinc-500">Go to</p>
      <ul className="flex flex-wrap gap-x-4 gap-y-1 text-sm">
        {links.map((l) => (
          <li key={l.href}>
            <a href={l.href} className="text-zinc-600 hover:text-accent-700 hover:underline">
              {l.label}
              {l.count !== undefined ? <span className="ml-1 text-zinc-400 tabular-nums">{l.count}</span> : null}
              {l.note ? <span className="ml-1 text-zinc-400">({l.note})</span> : null}
            </a>
          </li>
        ))}
      </ul>
    </nav>
  );
}

interface Conflict {
  /** The version now on the server, or null when it could not be loaded. */
  latest: DesignDto | null;
  mine: Design;
}

const FORM_ID = 'design-form';

/** What the page hands the design studio (the canvas): the form's design, parsed, and a way to change it. */
export interface StudioSlot {
  design: Design;
  readOnly: boolean;
  onChange(design: Design): void;
}

/**
 * The design page's form (the canvas comes later): every field of the design JSON, saved with the
 * version it was loaded from. Viewers and makers get the same page read-only, without a save control.
 */
export function DesignEditor({
  workshopId,
  initial,
  canEdit,
  studio,
  conflictDetails,
  units = 'mm',
  heading,
}: {
  workshopId: number;
  initial: DesignDto;
  canEdit: boolean;
  /** The unit lengths are shown in (kept per user); every length box accepts either. */
  units?: LengthUnit;
  /** The page's title, shown in the sticky save bar so the studio gets the height. */
  heading?: { title: ReactNode; back?: ReactNode; subtitle?: (design: Design) => ReactNode };
  /** The canvas studio, composed in by the route (it lives in its own feature and chunk). */
  studio?: (slot: StudioSlot) => ReactNode;
  /** What changed between their saved version and mine, shown in the conflict dialog. */
  conflictDetails?: (theirs: Design, mine: Design) => ReactNode;
}) {
  const queryClient = useQueryClient();
  const [base, setBase] = useState<DesignDto>(initial);
  const [serverMessages, setServerMessages] = useState<FieldMessage[]>([]);
  const [conflict, setConflict] = useState<Conflict | null>(null);
  const [savedAt, setSavedAt] = useState<Date | null>(null);
  const update = useUpdateDesign(workshopId, initial.id);

  const form = useForm<DesignInput, unknown, Design>({
    resolver: zodResolver(designSchema),
    defaultValues: initial.design,
    mode: 'onSubmit',
    reValidateMode: 'onChange',
  });
  const { isSubmitting } = form.formState;
  const values = useWatch({ control: form.control });
  const isDirty = !sameDesign(values, base.design);
  const busy = isSubmitting || update.isPending;

  // The form starts again from a saved or reloaded version once the submit has finished
  // (react-hook-form's docs advise resetting after submission, not inside it).
  const [resetTo, setResetTo] = useState<DesignDto | null>(null);
  useEffect(() => {
    if (resetTo && !isSubmitting) {
      form.reset(resetTo.design);
      setResetTo(null);
    }
  }, [form, resetTo, isSubmitting]);

  const adopt = (dto: DesignDto) => {
    setBase(dto);
    setResetTo(dto);
  };

  const save = async (design: Design, version: number) => {
    setServerMessages([]);
    try {
      const saved = await update.mutateAsync({ version, design: designForSave(design) });
      adopt(saved);
      setConflict(null);
      setSavedAt(new Date());
    } catch (error) {
      if (isApiError(error) && error.isConflict) {
        const latest = await queryClient
          .fetchQuery({ ...designQueryOptions(workshopId, initial.id), staleTime: 0 })
          .catch(() => null);
        setConflict({ latest, mine: design });
        return;
      }
      setConflict(null);
      setServerMessages(applyApiError(error, form.setError, { stripPrefix: 'design' }));
    }
  };

  const onSubmit = form.handleSubmit((design) => save(design, base.version));

  // The studio and this form edit one design: the studio gets the form's values (last valid parse) and
  // its edits reset the form's values (the saved base stays the reference for "unsaved changes").
  const lastValid = useRef<Design>(initial.design);
  const studioDesign = useMemo(() => {
    const parsed = designSchema.safeParse(values);
    if (parsed.success) lastValid.current = parsed.data;
    return lastValid.current;
  }, [values]);

  // Ctrl+S / Cmd+S saves, as in any editor.
  const submitRef = useRef(onSubmit);
  submitRef.current = onSubmit;
  useEffect(() => {
    if (!canEdit) return;
    const onKey = (event: KeyboardEvent) => {
      if ((event.ctrlKey || event.metaKey) && event.key.toLowerCase() === 's') {
        event.preventDefault();
        void submitRef.current();
      }
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [canEdit]);

  const rootError = form.formState.errors.root?.server?.message;

  const discard = () => {
    form.reset(base.design);
    setServerMessages([]);
  };

  return (
    <LengthUnitContext value={units}>
      <FormProvider {...form}>
        {/* The page's title and its one save bar, kept in view below the app header while the page scrolls. */}
        <div className="sticky top-[calc(3.5rem+1px)] z-20 -mx-6 -mt-3 mb-3 border-b border-zinc-200 bg-zinc-50/95 px-6 py-2 backdrop-blur">
          <div className="flex min-h-11 items-center justify-between gap-4" data-testid="save-status">
            <div className="min-w-0">
              {heading ? (
                <div className="flex min-w-0 items-baseline gap-2">
                  {heading.back ? <span className="shrink-0 text-[13px]">{heading.back}</span> : null}
                  <h1 className="truncate text-[17px] leading-6 font-bold text-zinc-900">{heading.title}</h1>
                  {heading.subtitle ? (
                    <span className="shrink-0 text-[13px] whitespace-nowrap text-zinc-500 tabular-nums">{heading.subtitle(studioDesign)}</span>
                  ) : null}
                </div>
              ) : null}
              <div className="flex min-w-0 items-center gap-2 text-[13px]">
                {!canEdit ? (
                  <p className="flex shrink-0 items-center gap-1.5 text-zinc-700">
                    <span className="size-2 rounded-full bg-zinc-400" />
                    <strong>Read only</strong>
                    <span className="text-zinc-500">· your role lets you read this design, not change it</span>
                  </p>
                ) : isDirty ? (
                  <p className="flex shrink-0 items-center gap-1.5 font-bold text-amber-800">
                    <span className="size-2 rounded-full bg-amber-500" /> Unsaved changes
                  </p>
                ) : (
                  <p className="flex shrink-0 items-center gap-1.5 text-zinc-700">
                    <span className="size-2 rounded-full bg-accent-500" />
                    {savedAt ? 'All changes saved' : 'No changes'}
                  </p>
                )}
                <span className="truncate text-zinc-500" title={formatDateTime(base.updatedAt)}>
                  · Version {base.version}, saved {formatRelativeTime(base.updatedAt)}
                  {base.updatedBy ? ` by ${base.updatedBy}` : ''}
                </span>
              </div>
            </div>
            {canEdit ? (
              <div className="flex shrink-0 gap-2">
                <Button disabled={!isDirty || busy} onClick={discard}>
                  Discard changes
                </Button>
                <Button type="submit" form={FORM_ID} variant="primary" busy={busy} disabled={!isDirty && !busy} title="Save (Ctrl+S)">
                  Save design
                </Button>
              </div>
            ) : null}
          </div>
        </div>

        {serverMessages.length > 0 || rootError ? (
          <Alert tone="error" title="Not saved" className="mb-5">
            {serverMessages.length > 0 ? (
              <>
                <p>Please correct the fields marked below:</p>
                <ul className="mt-1 list-disc space-y-0.5 pl-5">
                  {serverMessages.map((m) => (
                    <li key={m.formPath}>
                      {describeFormPath(m.formPath)}: {m.message}
                    </li>
                  ))}
                </ul>
              </>
            ) : (
              rootError
            )}
          </Alert>
        ) : null}

        {studio ? (
          <div className="mb-6">
            {studio({ design: studioDesign, readOnly: !canEdit, onChange: (design) => form.reset(design, { keepDefaultValues: true }) })}
          </div>
        ) : null}
        <div className="grid grid-cols-1 items-start gap-6 lg:grid-cols-[minmax(0,1fr)_22rem]">
          <form id={FORM_ID} onSubmit={onSubmit} noValidate className="min-w-0" aria-label="Design">
            <fieldset disabled={!canEdit} className="min-w-0 space-y-5">
              <BoxSection readOnly={!canEdit} />
              <BracesSection readOnly={!canEdit} />
              <OpeningsSection readOnly={!canEdit} />
              <LiningSection readOnly={!canEdit} />
            </fieldset>
          </form>

          <aside className="space-y-4 lg:sticky lg:top-32">
            <PlanSummary workshopId={workshopId} designId={base.id} version={base.version} dirty={isDirty} />
            <SectionLinks braces={values.braces?.length ?? 0} openings={values.openings?.length ?? 0} lined={values.lining != null} />
          </aside>
        </div>

        <LeaveGuard when={canEdit && isDirty && !busy} />

        <Dialog
          open={conflict !== null}
          onClose={() => setConflict(null)}
          role="alertdialog"
          wide
          title="Someone else saved this design"
          footer={
            conflict?.latest ? (
              <>
                <Button onClick={() => setConflict(null)} disabled={busy}>
                  Cancel
                </Button>
                <Button onClick={() => conflict.latest && (adopt(conflict.latest), setConflict(null))} disabled={busy}>
                  Reload their version
                </Button>
                <Button variant="primary" busy={busy} onClick={() => conflict.latest && save(conflict.mine, conflict.latest.version)}>
                  Keep mine (overwrite)
                </Button>
              </>
            ) : (
              <Button onClick={() => setConflict(null)}>Close</Button>
            )
          }
        >
          {conflict?.latest ? (
            <div className="space-y-2">
              <p>
                Since you opened it, version {conflict.latest.version} was saved
                {conflict.latest.updatedBy ? ` by ${conflict.latest.updatedBy}` : ''}, {formatRelativeTime(conflict.latest.updatedAt)}.
              </p>
              <p>
                <strong className="text-zinc-900">Reload their version</strong> drops your changes.{' '}
                <strong className="text-zinc-900">Keep mine</strong> saves your version over theirs.
              </p>
              {conflictDetails ? conflictDetails(conflict.latest.design, conflict.mine) : null}
            </div>
          ) : (
            <p>The newer version could not be loaded just now. Your changes are still here; try saving again in a moment.</p>
          )}
        </Dialog>
      </FormProvider>
    </LengthUnitContext>
  );
}
