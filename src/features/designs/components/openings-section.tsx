import type { ReactNode } from 'react';
import { useFieldArray, useFormContext, useWatch } from 'react-hook-form';
import { FACE_COORDS, FACES, type DesignInput, type Face } from '../../../../shared/schemas/design.schema';
import { Button } from '../../../components/ui/button';
import { Card } from '../../../components/ui/card';
import { Checkbox, Field, Select } from '../../../components/ui/field';
import { faceCentre, newOpening, type OpeningInput } from '../defaults';
import { COORD_LABELS, FACE_LABELS, OPENING_LABELS } from '../labels';
import { ItemCard, ItemError, LengthField, NumField, SelectField } from './fields';

const FACE_OPTIONS = FACES.map((f) => ({ value: f, label: FACE_LABELS[f] }));
const OPENING_TYPES = ['driver', 'port', 'terminal', 'lead'] as const;

export function OpeningsSection({ readOnly }: { readOnly: boolean }) {
  const { control, getValues } = useFormContext<DesignInput>();
  const { fields, append, remove } = useFieldArray({ control, name: 'openings' });
  const openings = (useWatch({ control, name: 'openings' }) ?? []) as OpeningInput[];

  const counters: Record<OpeningInput['type'], number> = { driver: 0, port: 0, terminal: 0, lead: 0 };
  return (
    <Card
      id="openings"
      title="Openings"
      description="Drivers, ports, terminals and lead holes. Positions are the centre of the hole in box coordinates."
      actions={
        readOnly ? null : (
          <>
            {OPENING_TYPES.map((type) => (
              <Button key={type} size="sm" onClick={() => append(newOpening(type, getValues('outer')), { shouldFocus: false })}>
                Add {OPENING_LABELS[type].toLowerCase()}
              </Button>
            ))}
          </>
        )
      }
    >
      {fields.length === 0 ? <p className="text-sm text-zinc-500">No openings.</p> : null}
      <div className="space-y-3">
        {fields.map((field, index) => {
          const opening = openings[index];
          if (!opening) return null;
          counters[opening.type] += 1;
          const title = `${OPENING_LABELS[opening.type]} ${counters[opening.type]}`;
          return (
            <ItemCard
              key={field.id}
              testId="opening"
              title={title}
              meta={`on the ${FACE_LABELS[opening.face].toLowerCase()}`}
              removeLabel={`Remove ${title.toLowerCase()}`}
              onRemove={readOnly ? undefined : () => remove(index)}
            >
              <OpeningFields index={index} opening={opening} />
              <ItemError name={`openings.${index}`} />
            </ItemCard>
          );
        })}
      </div>
    </Card>
  );
}

function OpeningFields({ index, opening }: { index: number; opening: OpeningInput }) {
  const { setValue, getValues } = useFormContext<DesignInput>();
  const base = `openings.${index}` as const;
  const [a, b] = FACE_COORDS[opening.face];

  // Moving an opening to another face: give it the coordinates that face needs, at the face's centre.
  const onFaceChange = (face: Face) => {
    const centre = faceCentre(face, getValues('outer'));
    for (const axis of FACE_COORDS[face]) {
      if (getValues(`${base}.${axis}`) === undefined) setValue(`${base}.${axis}`, centre[axis], { shouldDirty: true });
    }
  };

  return (
    <div className="space-y-3">
      <div className="grid grid-cols-4 gap-3">
        <SelectField name={`${base}.face`} label="Face" options={FACE_OPTIONS} onValueChange={onFaceChange} />
        <LengthField key={`${opening.face}-${a}`} name={`${base}.${a}`} label={COORD_LABELS[a]} />
        <LengthField key={`${opening.face}-${b}`} name={`${base}.${b}`} label={COORD_LABELS[b]} />
      </div>
      {opening.type === 'driver' ? <DriverFields index={index} opening={opening} /> : null}
      {opening.type === 'port' ? <PortFields index={index} opening={opening} /> : null}
      {opening.type === 'terminal' ? <TerminalFields index={index} opening={opening} /> : null}
      {opening.type === 'lead' ? (
        <div className="grid grid-cols-4 gap-3">
          <LengthField name={`${base}.diameter`} label="Hole diameter" />
        </div>
      ) : null}
    </div>
  );
}

function DriverFields({ index, opening }: { index: number; opening: Extract<OpeningInput, { type: 'driver' }> }) {
  const { setValue } = useFormContext<DesignInput>();
  const base = `openings.${index}` as const;
  const diameter = opening.diameter ?? 100;
  return (
    <>
      <div className="grid grid-cols-4 gap-3">
        <LengthField name={`${base}.diameter`} label="Cut-out diameter" />
        <NumField name={`${base}.displacementLitres`} label="Displacement" unit="L" hint="Volume the driver takes inside." />
        <NumField name={`${base}.coneAreaCm2`} label="Cone area (Sd)" unit="cm²" placeholder="—" />
        <NumField name={`${base}.excursionMm`} label="Excursion (Xmax)" unit="mm" placeholder="—" />
      </div>
      <div className="flex flex-wrap gap-x-8 gap-y-3">
        <OptionalGroup
          label="Rebate for flush mounting"
          checked={opening.rebate !== undefined}
          onToggle={(on) =>
            setValue(`${base}.rebate`, on ? { diameter: Math.round(diameter + 16), depth: 5 } : undefined, { shouldDirty: true })
          }
        >
          <LengthField name={`${base}.rebate.diameter`} label="Rebate diameter" />
          <LengthField name={`${base}.rebate.depth`} label="Rebate depth" />
        </OptionalGroup>
        <OptionalGroup
          label="Screw holes"
          checked={opening.screwHoles !== undefined}
          onToggle={(on) =>
            setValue(
              `${base}.screwHoles`,
              on ? { count: 4, circleDiameter: Math.round(diameter + 8), holeDiameter: 4 } : undefined,
              { shouldDirty: true },
            )
          }
        >
          <NumField name={`${base}.screwHoles.count`} label="Count" step={1} />
          <LengthField name={`${base}.screwHoles.circleDiameter`} label="On a circle of" />
          <LengthField name={`${base}.screwHoles.holeDiameter`} label="Hole diameter" />
        </OptionalGroup>
      </div>
    </>
  );
}

function PortFields({ index, opening }: { index: number; opening: Extract<OpeningInput, { type: 'port' }> }) {
  const { setValue, getValues } = useFormContext<DesignInput>();
  const base = `openings.${index}` as const;
  const shape = opening.shape ?? 'round';
  const onShapeChange = (next: 'round' | 'slot') => {
    if (next === 'slot') {
      if (getValues(`${base}.width`) === undefined) setValue(`${base}.width`, 100, { shouldDirty: true });
      if (getValues(`${base}.height`) === undefined) setValue(`${base}.height`, 30, { shouldDirty: true });
      setValue(`${base}.diameter`, undefined, { shouldDirty: true });
    } else {
      if (getValues(`${base}.diameter`) === undefined) setValue(`${base}.diameter`, 50, { shouldDirty: true });
      setValue(`${base}.width`, undefined, { shouldDirty: true });
      setValue(`${base}.height`, undefined, { shouldDirty: true });
    }
  };
  return (
    <div className="grid grid-cols-4 gap-3">
      <SelectField
        name={`${base}.shape`}
        label="Shape"
        options={[
          { value: 'round', label: 'Round tube' },
          { value: 'slot', label: 'Slot' },
        ]}
        onValueChange={onShapeChange}
      />
      {shape === 'round' ? (
        <>
          <LengthField name={`${base}.diameter`} label="Inner diameter" />
          <LengthField name={`${base}.wall`} label="Tube wall" />
        </>
      ) : (
        <>
          <LengthField name={`${base}.width`} label="Inner width" />
          <LengthField name={`${base}.height`} label="Inner height" />
        </>
      )}
      <LengthField name={`${base}.length`} label="Length" hint="From the outer face." />
      <NumField name={`${base}.targetHz`} label="Target tuning" unit="Hz" placeholder="—" hint="Optional." />
    </div>
  );
}

function TerminalFields({ index, opening }: { index: number; opening: Extract<OpeningInput, { type: 'terminal' }> }) {
  const { setValue } = useFormContext<DesignInput>();
  const base = `openings.${index}` as const;
  const round = opening.diameter !== undefined && (opening.width === undefined || opening.height === undefined);
  const onShapeChange = (next: string) => {
    if (next === 'round') {
      setValue(`${base}.diameter`, 40, { shouldDirty: true });
      setValue(`${base}.width`, undefined, { shouldDirty: true });
      setValue(`${base}.height`, undefined, { shouldDirty: true });
    } else {
      setValue(`${base}.width`, 60, { shouldDirty: true });
      setValue(`${base}.height`, 60, { shouldDirty: true });
      setValue(`${base}.diameter`, undefined, { shouldDirty: true });
    }
  };
  return (
    <div className="grid grid-cols-4 gap-3">
      <Field label="Cut-out">
        {({ id }) => (
          <Select id={id} value={round ? 'round' : 'rect'} onChange={(event) => onShapeChange(event.target.value)}>
            <option value="rect">Rectangular</option>
            <option value="round">Round</option>
          </Select>
        )}
      </Field>
      {round ? (
        <LengthField name={`${base}.diameter`} label="Diameter" />
      ) : (
        <>
          <LengthField name={`${base}.width`} label="Width" />
          <LengthField name={`${base}.height`} label="Height" />
        </>
      )}
    </div>
  );
}

function OptionalGroup({
  label,
  checked,
  onToggle,
  children,
}: {
  label: string;
  checked: boolean;
  onToggle: (on: boolean) => void;
  children: ReactNode;
}) {
  return (
    <div className="min-w-0">
      <Checkbox label={label} checked={checked} onChange={(event) => onToggle(event.target.checked)} />
      {checked ? <div className="mt-2 grid grid-cols-3 gap-3">{children}</div> : null}
    </div>
  );
}
