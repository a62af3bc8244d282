import { Card } from '../../../components/ui/card';
import { JoineryField } from './joinery-field';
import { NumField, TextField } from './fields';

const MATERIALS = ['MDF', 'Birch plywood', 'Plywood', 'Particleboard', 'HDF'];

export function BoxSection({ readOnly }: { readOnly: boolean }) {
  return (
    <Card id="box" title="Box" description="Outer size, sheet material and how the panels join. All lengths in millimetres.">
      <div className="space-y-5">
        <TextField name="name" label="Name" />
        <div>
          <p className="mb-2 text-[13px] font-bold text-zinc-700">Outer size</p>
          <div className="grid grid-cols-3 gap-3">
            <NumField name="outer.width" label="Width (W)" unit="mm" />
            <NumField name="outer.height" label="Height (H)" unit="mm" />
            <NumField name="outer.depth" label="Depth (D)" unit="mm" />
          </div>
        </div>
        <div>
          <p className="mb-2 text-[13px] font-bold text-zinc-700">Material</p>
          <div className="grid grid-cols-3 gap-3">
            <TextField name="material.name" label="Sheet material" list="boxwright-materials" />
            <NumField name="material.thickness" label="Panel thickness" unit="mm" />
            <NumField
              name="baffleThickness"
              label="Baffle thickness"
              unit="mm"
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
