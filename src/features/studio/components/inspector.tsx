/**
 * The selected item's values, typed in either unit. Every commit is one undoable command. Read-only
 * users see the same values without editing.
 */
import { FACE_COORDS, FACES, type Axis, type Face } from '../../../../shared/schemas/design.schema';
import type { StudioEditor } from '../model/editor';
import { cavity, otherAxes } from '../model/geometry';
import type { Selection, StudioDoc, UnitSystem } from '../model/types';
import { LengthInput, NumberField } from './length-input';

const FACE_LABEL: Record<Face, string> = { front: 'Front (baffle)', back: 'Back', left: 'Left side', right: 'Right side', top: 'Top', bottom: 'Bottom' };
const TYPE_LABEL = { driver: 'Driver', port: 'Port', terminal: 'Terminal', lead: 'Cable lead' } as const;

export interface InspectorProps {
  editor: StudioEditor;
  doc: StudioDoc;
  selection: Selection;
  units: UnitSystem;
  readOnly: boolean;
  /** Warning and error messages about the selected item. */
  messages: string[];
}

function Section({ title, children, action }: { title: string; children: React.ReactNode; action?: React.ReactNode }) {
  return (
    <section className="space-y-2">
      <div className="flex items-center justify-between">
        <h3 className="text-[11px] font-bold uppercase tracking-wider text-zinc-500">{title}</h3>
        {action}
      </div>
      {children}
    </section>
  );
}

export function Inspector({ editor, doc, selection, units, readOnly, messages }: InspectorProps) {
  const L = (label: string, path: (string | number)[], valueMm: number | undefined, opts: { allowEmpty?: boolean; min?: number } = {}) => (
    <LengthInput
      key={path.join('.')}
      label={label}
      valueMm={valueMm}
      units={units}
      readOnly={readOnly}
      allowEmpty={opts.allowEmpty}
      min={opts.min}
      testId={`field-${path.join('.')}`}
      onCommit={(v) => editor.setField(path, v)}
    />
  );
  const N = (label: string, path: (string | number)[], value: number | undefined, unit: string, allowEmpty = true) => (
    <NumberField key={path.join('.')} label={label} value={value} unit={unit} readOnly={readOnly} allowEmpty={allowEmpty} onCommit={(v) => editor.setField(path, v)} />
  );
  const del = !readOnly && (
    <button type="button" className="rounded px-2 py-0.5 text-[12px] text-red-700 hover:bg-red-50" onClick={() => editor.deleteSelection()}>
      Delete
    </button>
  );
  const notes = messages.length > 0 && (
    <ul className="space-y-1 rounded border border-amber-200 bg-amber-50 p-2 text-[12px] leading-snug text-amber-900">
      {messages.map((m) => (
        <li key={m}>{m}</li>
      ))}
    </ul>
  );

  if (selection?.kind === 'brace') {
    const b = doc.braces[selection.index];
    if (!b) return null;
    const i = selection.index;
    if (b.type === 'shelf') {
      return (
        <Section title={`Shelf brace ${i + 1}`} action={del}>
          <AxisSelect
            value={b.axis}
            readOnly={readOnly}
            onChange={(axis) => {
              const c = cavity(doc)[axis];
              editor.setField(['braces', i], { ...b, axis, position: (c.min + c.max) / 2, windows: [] });
            }}
            label="Across axis"
          />
          {L(`Position (${b.axis})`, ['braces', i, 'position'], b.position, { min: -1 })}
          {L('Thickness', ['braces', i, 'thickness'], b.thickness)}
          <WindowsEditor
            windows={b.windows}
            axes={otherAxes(b.axis)}
            readOnly={readOnly}
            L={(label, j, key, v) => L(label, ['braces', i, 'windows', j, key], v, { min: key === 'u' || key === 'v' ? -1 : 0 })}
            onChange={(windows) => editor.setField(['braces', i, 'windows'], windows)}
            newWindow={() => {
              const c = cavity(doc);
              const [u, v] = otherAxes(b.axis);
              const span = Math.min(c[u].max - c[u].min, c[v].max - c[v].min);
              return { shape: 'round', u: (c[u].min + c[u].max) / 2, v: (c[v].min + c[v].max) / 2, diameter: Math.round(span * 0.4) };
            }}
          />
          {notes}
        </Section>
      );
    }
    const [a0, a1] = otherAxes(b.axis);
    return (
      <Section title={`Bar brace ${i + 1}`} action={del}>
        <AxisSelect
          value={b.axis}
          readOnly={readOnly}
          label="Runs along"
          onChange={(axis) => {
            const c = cavity(doc);
            const [n0, n1] = otherAxes(axis);
            editor.setField(['braces', i], { ...b, axis, at: [(c[n0].min + c[n0].max) / 2, (c[n1].min + c[n1].max) / 2] });
          }}
        />
        {L(`Centre ${a0}`, ['braces', i, 'at', 0], b.at[0], { min: -1 })}
        {L(`Centre ${a1}`, ['braces', i, 'at', 1], b.at[1], { min: -1 })}
        {L(`Section along ${a0}`, ['braces', i, 'section', 0], b.section[0])}
        {L(`Section along ${a1}`, ['braces', i, 'section', 1], b.section[1])}
        {notes}
      </Section>
    );
  }

  if (selection?.kind === 'opening') {
    const o = doc.openings[selection.index];
    if (!o) return null;
    const i = selection.index;
    const title = o.type === 'port' ? (o.shape === 'slot' ? 'Slot port' : 'Round port') : TYPE_LABEL[o.type];
    return (
      <Section title={`${title} · opening ${i + 1}`} action={del}>
        <label className="grid grid-cols-[1fr_7.5rem] items-center gap-2 text-[13px]">
          <span className="text-zinc-600">Face</span>
          <select
            className="h-7 rounded border border-zinc-300 bg-white px-1 text-[12.5px] disabled:bg-zinc-50 disabled:text-zinc-500"
            value={o.face}
            disabled={readOnly}
            onChange={(e) => editor.setOpeningFace(i, e.target.value as Face)}
          >
            {FACES.map((f) => (
              <option key={f} value={f}>
                {FACE_LABEL[f]}
              </option>
            ))}
          </select>
        </label>
        {FACE_COORDS[o.face].map((axis: Axis) => L(`Centre ${axis}`, ['openings', i, axis], o[axis], { min: -1 }))}
        {o.type === 'driver' && (
          <>
            {L('Cut-out diameter', ['openings', i, 'diameter'], o.diameter)}
            {L('Rebate diameter', ['openings', i, 'rebate', 'diameter'], o.rebate?.diameter, { allowEmpty: true })}
            {N('Displacement', ['openings', i, 'displacementLitres'], o.displacementLitres, 'L', false)}
            {N('Cone area Sd', ['openings', i, 'coneAreaCm2'], o.coneAreaCm2, 'cm²')}
            {N('Excursion Xmax', ['openings', i, 'excursionMm'], o.excursionMm, 'mm')}
          </>
        )}
        {o.type === 'port' && (
          <>
            {o.shape === 'slot' ? (
              <>
                {L('Slot width', ['openings', i, 'width'], o.width)}
                {L('Slot height', ['openings', i, 'height'], o.height)}
              </>
            ) : (
              <>
                {L('Inner diameter', ['openings', i, 'diameter'], o.diameter)}
                {L('Tube wall', ['openings', i, 'wall'], o.wall, { min: -0.0001 })}
              </>
            )}
            {L('Length', ['openings', i, 'length'], o.length)}
            {N('Target tuning', ['openings', i, 'targetHz'], o.targetHz, 'Hz')}
          </>
        )}
        {o.type === 'terminal' &&
          (o.width !== undefined && o.height !== undefined ? (
            <>
              {L('Width', ['openings', i, 'width'], o.width)}
              {L('Height', ['openings', i, 'height'], o.height)}
            </>
          ) : (
            L('Diameter', ['openings', i, 'diameter'], o.diameter)
          ))}
        {o.type === 'lead' && L('Diameter', ['openings', i, 'diameter'], o.diameter)}
        {notes}
      </Section>
    );
  }

  return (
    <Section title="Box">
      {L('Outer width', ['outer', 'width'], doc.outer.width)}
      {L('Outer height', ['outer', 'height'], doc.outer.height)}
      {L('Outer depth', ['outer', 'depth'], doc.outer.depth)}
      {L('Panel thickness', ['material', 'thickness'], doc.material.thickness)}
      {L('Baffle thickness', ['baffleThickness'], doc.baffleThickness, { allowEmpty: true })}
      {doc.lining && L('Lining thickness', ['lining', 'thickness'], doc.lining.thickness)}
      {!readOnly && (
        <p className="pt-1 text-[12px] leading-snug text-zinc-500">
          Drag the right, top or back edge of a drawing to resize. Select a brace or an opening to move it; arrow keys nudge
          (Shift: ×10).
        </p>
      )}
      {notes}
    </Section>
  );
}

type Win = Extract<StudioDoc['braces'][number], { type: 'shelf' }>['windows'][number];

/** A shelf brace's windows (the openings that let air pass): centre on the brace, size, add and remove. */
function WindowsEditor({
  windows,
  axes,
  readOnly,
  L,
  onChange,
  newWindow,
}: {
  windows: Win[];
  axes: [Axis, Axis];
  readOnly: boolean;
  L: (label: string, index: number, key: string, valueMm: number) => React.ReactNode;
  onChange(windows: Win[]): void;
  newWindow(): Win;
}) {
  return (
    <div className="space-y-2 rounded border border-zinc-200 p-2">
      <div className="flex items-center justify-between">
        <span className="text-[12px] text-zinc-600">
          {windows.length === 0 ? 'No windows: the brace closes the box into two chambers.' : `Windows (${windows.length}) let air pass`}
        </span>
        {!readOnly && (
          <button type="button" className="rounded px-1.5 py-0.5 text-[12px] text-accent-700 hover:bg-accent-50" onClick={() => onChange([...windows, newWindow()])}>
            Add window
          </button>
        )}
      </div>
      {windows.map((w, j) => (
        <div key={j} className="space-y-1.5 border-t border-zinc-100 pt-1.5">
          <div className="flex items-center justify-between text-[12px] text-zinc-500">
            <span>
              Window {j + 1} · {w.shape === 'round' ? 'round' : 'rectangular'}
            </span>
            {!readOnly && (
              <button type="button" className="rounded px-1.5 text-red-700 hover:bg-red-50" onClick={() => onChange(windows.filter((_, k) => k !== j))} aria-label={`Remove window ${j + 1}`}>
                Remove
              </button>
            )}
          </div>
          {L(`Centre ${axes[0]}`, j, 'u', w.u)}
          {L(`Centre ${axes[1]}`, j, 'v', w.v)}
          {w.shape === 'round' ? (
            L('Diameter', j, 'diameter', w.diameter)
          ) : (
            <>
              {L(`Size along ${axes[0]}`, j, 'width', w.width)}
              {L(`Size along ${axes[1]}`, j, 'height', w.height)}
            </>
          )}
        </div>
      ))}
    </div>
  );
}

function AxisSelect({ value, onChange, readOnly, label }: { value: Axis; onChange(a: Axis): void; readOnly: boolean; label: string }) {
  return (
    <label className="grid grid-cols-[1fr_7.5rem] items-center gap-2 text-[13px]">
      <span className="text-zinc-600">{label}</span>
      <select
        className="h-7 rounded border border-zinc-300 bg-white px-1 text-[12.5px] disabled:bg-zinc-50 disabled:text-zinc-500"
        value={value}
        disabled={readOnly}
        onChange={(e) => onChange(e.target.value as Axis)}
      >
        <option value="x">x (width)</option>
        <option value="y">y (height)</option>
        <option value="z">z (depth)</option>
      </select>
    </label>
  );
}
