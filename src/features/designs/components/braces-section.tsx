import { useFieldArray, useFormContext, useWatch } from 'react-hook-form';
import { AXES, type Axis, type DesignInput } from '../../../../shared/schemas/design.schema';
import { Button } from '../../../components/ui/button';
import { Card } from '../../../components/ui/card';
import { newBrace, newWindow, otherAxes, type BraceInput, type WindowInput } from '../defaults';
import { BAR_AXIS_LABELS, COORD_LABELS, SHELF_AXIS_LABELS } from '../labels';
import { ItemCard, ItemError, LengthField, SelectField } from './fields';

const axisOptions = (labels: Record<Axis, string>) => AXES.map((a) => ({ value: a, label: labels[a] }));

export function BracesSection({ readOnly }: { readOnly: boolean }) {
  const { control, getValues } = useFormContext<DesignInput>();
  const { fields, append, remove } = useFieldArray({ control, name: 'braces' });
  const braces = (useWatch({ control, name: 'braces' }) ?? []) as BraceInput[];

  const add = (type: BraceInput['type']) =>
    append(newBrace(type, getValues('outer'), getValues('material.thickness') || 18), { shouldFocus: false });

  let shelfNo = 0;
  let barNo = 0;
  return (
    <Card
      id="braces"
      title="Braces"
      description="Shelf braces cross the whole inside of the box; bar braces run between two opposite inner faces."
      actions={
        readOnly ? null : (
          <>
            <Button size="sm" onClick={() => add('shelf')}>
              Add shelf brace
            </Button>
            <Button size="sm" onClick={() => add('bar')}>
              Add bar brace
            </Button>
          </>
        )
      }
    >
      {fields.length === 0 ? <p className="text-sm text-zinc-500">No braces.</p> : null}
      <div className="space-y-3">
        {fields.map((field, index) => {
          const brace = braces[index];
          if (!brace) return null;
          if (brace.type === 'shelf') {
            shelfNo += 1;
            return (
              <ItemCard
                key={field.id}
                testId="brace"
                title={`Shelf brace ${shelfNo}`}
                meta={SHELF_AXIS_LABELS[brace.axis]}
                removeLabel={`Remove shelf brace ${shelfNo}`}
                onRemove={readOnly ? undefined : () => remove(index)}
              >
                <div className="grid grid-cols-3 gap-3">
                  <SelectField name={`braces.${index}.axis`} label="Lies" options={axisOptions(SHELF_AXIS_LABELS)} />
                  <LengthField
                    name={`braces.${index}.position`}
                    label={`Centre plane, ${COORD_LABELS[brace.axis]}`}
                  />
                  <LengthField name={`braces.${index}.thickness`} label="Thickness" />
                </div>
                <ShelfWindows braceIndex={index} axis={brace.axis} readOnly={readOnly} />
                <ItemError name={`braces.${index}`} />
              </ItemCard>
            );
          }
          barNo += 1;
          const [a, b] = otherAxes(brace.axis);
          return (
            <ItemCard
              key={field.id}
              testId="brace"
              title={`Bar brace ${barNo}`}
              meta={BAR_AXIS_LABELS[brace.axis]}
              removeLabel={`Remove bar brace ${barNo}`}
              onRemove={readOnly ? undefined : () => remove(index)}
            >
              <div className="grid grid-cols-3 gap-3">
                <SelectField name={`braces.${index}.axis`} label="Runs" options={axisOptions(BAR_AXIS_LABELS)} />
                <LengthField name={`braces.${index}.at.0`} label={`Centre, ${COORD_LABELS[a]}`} />
                <LengthField name={`braces.${index}.at.1`} label={`Centre, ${COORD_LABELS[b]}`} />
                <div />
                <LengthField name={`braces.${index}.section.0`} label={`Section along ${a}`} />
                <LengthField name={`braces.${index}.section.1`} label={`Section along ${b}`} />
              </div>
              <ItemError name={`braces.${index}`} />
            </ItemCard>
          );
        })}
      </div>
    </Card>
  );
}

function ShelfWindows({ braceIndex, axis, readOnly }: { braceIndex: number; axis: Axis; readOnly: boolean }) {
  const { control, getValues } = useFormContext<DesignInput>();
  const name = `braces.${braceIndex}.windows` as const;
  const { fields, append, remove } = useFieldArray({ control, name });
  const windows = (useWatch({ control, name }) ?? []) as WindowInput[];
  const [u, v] = otherAxes(axis);

  return (
    <div className="mt-4">
      <div className="mb-2 flex items-center justify-between">
        <p className="text-[13px] font-bold text-zinc-700">
          Windows <span className="font-normal text-zinc-500">(openings that let air pass)</span>
        </p>
        {readOnly ? null : (
          <div className="flex gap-1">
            <Button size="sm" variant="ghost" onClick={() => append(newWindow('rect', axis, getValues('outer')), { shouldFocus: false })}>
              + Rectangular
            </Button>
            <Button size="sm" variant="ghost" onClick={() => append(newWindow('round', axis, getValues('outer')), { shouldFocus: false })}>
              + Round
            </Button>
          </div>
        )}
      </div>
      {fields.length === 0 ? <p className="text-xs text-zinc-500">No windows: the brace is solid.</p> : null}
      <div className="space-y-2">
        {fields.map((field, w) => {
          const win = windows[w];
          if (!win) return null;
          const base = `braces.${braceIndex}.windows.${w}` as const;
          return (
            <div key={field.id} className="flex items-end gap-3 rounded-md border border-zinc-200 bg-white px-3 py-2">
              <span className="w-24 shrink-0 pb-2 text-xs text-zinc-500">
                {win.shape === 'rect' ? 'Rectangular' : 'Round'} {w + 1}
              </span>
              <div className="grid flex-1 grid-cols-4 gap-3">
                <LengthField name={`${base}.u`} label={`Centre ${u}`} />
                <LengthField name={`${base}.v` as 'braces.0.windows.0.v'} label={`Centre ${v}`} />
                {win.shape === 'rect' ? (
                  <>
                    <LengthField name={`${base}.width`} label={`Size along ${u}`} />
                    <LengthField name={`${base}.height`} label={`Size along ${v}`} />
                  </>
                ) : (
                  <LengthField name={`${base}.diameter`} label="Diameter" />
                )}
              </div>
              {readOnly ? null : (
                <button
                  type="button"
                  onClick={() => remove(w)}
                  aria-label={`Remove window ${w + 1}`}
                  className="mb-1.5 rounded px-2 py-0.5 text-[13px] text-zinc-500 hover:bg-red-50 hover:text-red-700"
                >
                  Remove
                </button>
              )}
            </div>
          );
        })}
      </div>
    </div>
  );
}
