import { Card } from '../../../components/ui/card';
import { JoineryField } from './joinery-field';
import { LengthField, lengthUnitHint, NumField, TextField, useLengthUnit } from './fields';

const MATERIALS = ['MDF', 'Birch plywood', 'Plywood', 'Particleboard', 'HDF'];

export function BoxSection({ readOnly }: { readOnly: boolean }) {
  const unit = useLengthUnit();
  return (
    <Card id="box" title="Box" description={`Outer size, sheet material and how the panels join. ${lengthUnitHint(unit)}`}>
      <div className="space-y-5">
        <TextField name="name" label="Name" />
        <div>
          <p className="mb-2 text-[13px] font-bold text-zinc-700">Outer size</p>
          <div className="grid grid-cols-3 gap-3">
            <LengthField name="outer.width" label="Width (W)" />
            <LengthField name="outer.height" label="Height (H)" />
            <LengthField name="outer.depth" label="Depth (D)" />
          </div>
        </div>
        <div>
          <p className="mb-2 text-[13px] font-bold text-zinc-700">Material</p>
          <div className="grid grid-cols-3 gap-3">
            <TextField name="material.name" label="Sheet material" list="boxwright-materials" />
            <LengthField name="material.thickness" label="Panel thickness" />
            <LengthField
              name="baffleThickness"
              label="Baffle thickness"
              placeholder="same"
              hint="Empty: same as the panels."
            />
            <NumField name="material.density" label="Density" unit="kg/m³" placeholder="—" hint="For weight estimates." />
            <NumField name="airTemperatureC" label="Air temperature" unit="°C" hint="Sets the speed of sound for tuning." />
          </div>
          <datalist id="boxwright-materials">
            {MATERIALS.map((m) => (
              <option key={m} value={m} />
            ))}
          </datalist>
        </div>
        <JoineryField readOnly={readOnly} />
      </div>
    </Card>
  );
}
