import { useFormContext, useWatch } from 'react-hook-form';
import { FACES, type DesignInput } from '../../../../shared/schemas/design.schema';
import { Card } from '../../../components/ui/card';
import { Checkbox } from '../../../components/ui/field';
import { DEFAULT_LINING } from '../defaults';
import { FACE_LABELS } from '../labels';
import { ItemError, LengthField, NumField } from './fields';

export function LiningSection({ readOnly }: { readOnly: boolean }) {
  const { control, register, setValue } = useFormContext<DesignInput>();
  const lining = useWatch({ control, name: 'lining' });
  const lined = lining != null;

  return (
    <Card
      id="lining"
      title="Lining"
      description="Acoustic lining (for example polyester batt) cut to cover the inner faces."
      actions={
        readOnly ? null : (
          <Checkbox
            label="Line this box"
            checked={lined}
            onChange={(event) => setValue('lining', event.target.checked ? { ...DEFAULT_LINING } : null, { shouldDirty: true })}
          />
        )
      }
    >
      {lined ? (
        <div className="space-y-4">
          <div className="grid grid-cols-3 gap-3">
            <LengthField name="lining.thickness" label="Thickness" />
            <LengthField name="lining.crush" label="Crush allowance" hint="Pieces are cut this much larger each way." />
            <NumField name="lining.density" label="Fill density" unit="kg/m³" />
            <LengthField name="lining.minSliver" label="Smallest strip kept" hint="Narrower strips are dropped, with a warning." />
            <LengthField name="lining.portClearance" label="Clearance around ports" />
          </div>
          <fieldset>
            <legend className="mb-2 text-[13px] text-zinc-600">Faces to line</legend>
            <div className="flex flex-wrap gap-x-6 gap-y-2">
              {FACES.map((face) => (
                <Checkbox key={face} value={face} label={FACE_LABELS[face]} {...register('lining.faces')} />
              ))}
            </div>
            <ItemError name="lining.faces" />
          </fieldset>
        </div>
      ) : (
        <p className="text-sm text-zinc-500">This box has no lining.</p>
      )}
      <ItemError name="lining" />
    </Card>
  );
}
