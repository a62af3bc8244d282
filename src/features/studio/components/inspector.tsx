/**
 * The selected item's values, typed in either unit (Enter or leaving the field commits, Escape puts the
 * shown value back). Every commit is one undoable command. With nothing selected it shows the box, the
 * lining and a list of the items to pick from. Read-only users see the same values without editing.
 */
import type { ReactNode } from 'react';
import { FACE_COORDS, FACES, liningSchema, type Axis, type Face } from '../../../../shared/schemas/design.schema';
import type { StudioEditor } from '../model/editor';
import { cavity, otherAxes } from '../model/geometry';
import {
  defaultRebate,
  defaultScrewHoles,
  itemLabel,
  listItems,
  withLinedFace,
  withPortShape,
  withTerminalShape,
  withWindowShape,
} from '../model/items';
import type { Selection, StudioDoc, UnitSystem } from '../model/types';
import { formatLength } from '../model/units';
import { LengthInput, NumberField } from './length-input';

const FACE_LABEL: Record<Face, string> = { front: 'Front (baffle)', back: 'Back', left: 'Left side', right: 'Right side', top: 'Top', bottom: 'Bottom' };
const AXIS_WORD: Record<Axis, string> = { x: 'x from left', y: 'y from bottom', z: 'z from front' };

export interface InspectorProps {
  editor: StudioEditor;
  doc: StudioDoc;
  selection: Selection;
  units: UnitSystem;
  readOnly: boolean;
  /** The engine's messages about the selected item. */
  messages: ItemNote[];
}

/** A message about one item: an error (the design cannot be planned) or a warning. */
export interface ItemNote {
  tone: 'error' | 'warn';
  text: string;
}

function Section({ title, children, action, testId, notes }: { title: string; children: ReactNode; action?: ReactNode; testId?: string; notes?: ReactNode }) {
  return (
    <section className="space-y-2" data-testid={testId}>
      <div className="flex min-h-6 items-center justify-between">
        <h3 className="text-[11px] font-bold uppercase tracking-wider text-zinc-500">{title}</h3>
        {action}
      </div>
      {notes}
      {children}
    </section>
  );
}

/** A sub-group inside a section (windows, rebate, screw holes, lining faces). */
function Group({ title, action, children }: { title: ReactNode; action?: ReactNode; children?: ReactNode }) {
  return (
    <div className="space-y-1.5 rounded border border-zinc-200 bg-zinc-50/50 px-2 py-1.5">
      <div className="flex min-h-6 items-center justify-between gap-2 text-[12.5px] text-zinc-700">
        {title}
        {action}
      </div>
      {children}
    </div>
  );
}

function SelectRow<T extends string>({
  label,
  value,
  options,
  onChange,
  readOnly,
  testId,
}: {
  label: string;
  value: T;
  options: { value: T; label: string }[];
  onChange(v: T): void;
  readOnly: boolean;
  testId?: string;
}) {
  return (
    <label className="grid grid-cols-[1fr_7.5rem] items-center gap-2 text-[13px]">
      <span className="text-zinc-600">{label}</span>
      <select
        className="h-7 rounded border border-zinc-300 bg-white px-1 text-[12.5px] focus:border-accent-500 disabled:bg-zinc-50 disabled:text-zinc-500"
        value={value}
        disabled={readOnly}
        data-testid={testId}
        onChange={(e) => onChange(e.target.value as T)}
      >
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
    </label>
  );
}

/** A checkbox that adds or removes an optional part (a rebate, screw holes, the lining). */
function Toggle({
  label,
  checked,
  onChange,
  readOnly,
  testId,
  quiet,
}: {
  label: string;
  checked: boolean;
  onChange(on: boolean): void;
  readOnly: boolean;
  testId?: string;
  /** Normal weight (beside a section title) instead of a group's bold title. */
  quiet?: boolean;
}) {
  return (
    <label className={`flex cursor-pointer items-center gap-2 text-[12.5px] text-zinc-700 has-disabled:cursor-default ${quiet ? '' : 'font-bold'}`}>
      <input
        type="checkbox"
        className="size-3.5 accent-accent-600"
        checked={checked}
        disabled={readOnly}
        data-testid={testId}
        onChange={(e) => onChange(e.target.checked)}
      />
      {label}
    </label>
  );
}

/** An optional part of an item (a driver's rebate, its screw holes): a checkbox adds it with starting values or removes it. */
function OptionalPart<T>({
  label,
  path,
  value,
  make,
  editor,
  readOnly,
  children,
}: {
  label: string;
  path: (string | number)[];
  value: T | undefined;
  make(): T;
  editor: StudioEditor;
  readOnly: boolean;
  children(value: T): ReactNode;
}) {
  return (
    <Group
      title={
        <Toggle
          label={label}
          checked={value !== undefined}
          readOnly={readOnly}
          testId={`toggle-${path.join('.')}`}
          onChange={(on) => editor.setField(path, on ? make() : undefined)}
        />
      }
    >
      {value !== undefined && children(value)}
    </Group>
  );
}

const smallButton = 'rounded px-1.5 py-0.5 text-[12px] focus-visible:outline-2 focus-visible:outline-accent-500';

export function Inspector({ editor, doc, selection, units, readOnly, messages }: InspectorProps) {
  const L = (label: string, path: (string | number)[], valueMm: number | undefined, opts: { allowEmpty?: boolean; allowZero?: boolean } = {}) => (
    <LengthInput
      key={path.join('.')}
      label={label}
      valueMm={valueMm}
      units={units}
      readOnly={readOnly}
      allowEmpty={opts.allowEmpty}
      allowZero={opts.allowZero}
      testId={`field-${path.join('.')}`}
      onCommit={(v) => editor.setField(path, v)}
    />
  );
  const N = (
    label: string,
    path: (string | number)[],
    value: number | undefined,
    unit: string | undefined,
    opts: { allowEmpty?: boolean; integer?: { min: number; max: number }; positive?: boolean } = {},
  ) => (
    <NumberField
      key={path.join('.')}
      label={label}
      value={value}
      unit={unit}
      readOnly={readOnly}
      allowEmpty={opts.allowEmpty ?? true}
      integer={opts.integer}
      positive={opts.positive}
      testId={`field-${path.join('.')}`}
      onCommit={(v) => editor.setField(path, v)}
    />
  );
  const del = !readOnly && (
    <button type="button" className={`${smallButton} text-red-700 hover:bg-red-50`} onClick={() => editor.deleteSelection()} title="Delete (Delete key)">
      Delete
    </button>
  );
  const notes = messages.length > 0 && (
    <ul className="space-y-1" data-testid="inspector-notes">
      {messages.map((m) => (
        <li
          key={m.text}
          role={m.tone === 'error' ? 'alert' : undefined}
          className={`rounded border px-2 py-1.5 text-[12px] leading-snug ${
            m.tone === 'error' ? 'border-red-200 bg-red-50 text-red-800' : 'border-amber-200 bg-amber-50 text-amber-900'
          }`}
        >
          {m.text}
        </li>
      ))}
    </ul>
  );
  const title = itemLabel(doc, selection);

  if (selection?.kind === 'brace') {
    const b = doc.braces[selection.index];
    if (!b) return null;
    const i = selection.index;
    if (b.type === 'shelf') {
      const [u, v] = otherAxes(b.axis);
      return (
        <Section title={title ?? 'Shelf brace'} action={del} testId="inspector" notes={notes}>
          <SelectRow
            label="Lies across"
            value={b.axis}
            readOnly={readOnly}
            options={AXES_OPTIONS}
            onChange={(axis) => {
              const c = cavity(doc)[axis];
              editor.setField(['braces', i], { ...b, axis, position: (c.min + c.max) / 2, windows: [] });
            }}
          />
          {L(`Centre plane, ${b.axis}`, ['braces', i, 'position'], b.position, { allowZero: true })}
          {L('Thickness', ['braces', i, 'thickness'], b.thickness)}
          <Group
            title={b.windows.length === 0 ? <span className="text-zinc-600">No windows: the brace closes the box into two chambers.</span> : <span>Windows let air pass</span>}
            action={
              !readOnly && (
                <button
                  type="button"
                  className={`${smallButton} shrink-0 text-accent-700 hover:bg-accent-50`}
                  onClick={() => {
                    const c = cavity(doc);
                    const span = Math.min(c[u].max - c[u].min, c[v].max - c[v].min);
                    const win = { shape: 'round' as const, u: (c[u].min + c[u].max) / 2, v: (c[v].min + c[v].max) / 2, diameter: Math.round(span * 0.4) };
                    editor.setField(['braces', i, 'windows'], [...b.windows, win]);
                  }}
                >
                  Add window
                </button>
              )
            }
          >
            {b.windows.map((w, j) => {
              const at = ['braces', i, 'windows', j];
              return (
                <div key={j} className="space-y-1.5 border-t border-zinc-200 pt-1.5" data-testid="inspector-window">
                  <div className="flex items-center justify-between text-[12px] text-zinc-500">
                    <span>Window {j + 1}</span>
                    {!readOnly && (
                      <button
                        type="button"
                        className={`${smallButton} text-red-700 hover:bg-red-50`}
                        onClick={() => editor.setField(['braces', i, 'windows'], b.windows.filter((_, k) => k !== j))}
                        aria-label={`Remove window ${j + 1}`}
                      >
                        Remove
                      </button>
                    )}
                  </div>
                  <SelectRow
                    label="Shape"
                    value={w.shape}
                    readOnly={readOnly}
                    testId={`field-${at.join('.')}.shape`}
                    options={[
                      { value: 'rect', label: 'Rectangular' },
                      { value: 'round', label: 'Round' },
                    ]}
                    onChange={(shape) => editor.setField(at, withWindowShape(w, shape))}
                  />
                  {L(`Centre ${u}`, [...at, 'u'], w.u, { allowZero: true })}
                  {L(`Centre ${v}`, [...at, 'v'], w.v, { allowZero: true })}
                  {w.shape === 'round' ? (
                    L('Diameter', [...at, 'diameter'], w.diameter)
                  ) : (
                    <>
                      {L(`Size along ${u}`, [...at, 'width'], w.width)}
                      {L(`Size along ${v}`, [...at, 'height'], w.height)}
                    </>
                  )}
                </div>
              );
            })}
          </Group>
        </Section>
      );
    }
    const [a0, a1] = otherAxes(b.axis);
    return (
      <Section title={title ?? 'Bar brace'} action={del} testId="inspector" notes={notes}>
        <SelectRow
          label="Runs along"
          value={b.axis}
          readOnly={readOnly}
          options={AXES_OPTIONS}
          onChange={(axis) => {
            const c = cavity(doc);
            const [n0, n1] = otherAxes(axis);
            editor.setField(['braces', i], { ...b, axis, at: [(c[n0].min + c[n0].max) / 2, (c[n1].min + c[n1].max) / 2] });
          }}
        />
        {L(`Centre ${a0}`, ['braces', i, 'at', 0], b.at[0], { allowZero: true })}
        {L(`Centre ${a1}`, ['braces', i, 'at', 1], b.at[1], { allowZero: true })}
        {L(`Section along ${a0}`, ['braces', i, 'section', 0], b.section[0])}
        {L(`Section along ${a1}`, ['braces', i, 'section', 1], b.section[1])}
      </Section>
    );
  }

  if (selection?.kind === 'opening') {
    const o = doc.openings[selection.index];
    if (!o) return null;
    const i = selection.index;
    const at = ['openings', i];
    return (
      <Section title={title ?? 'Opening'} action={del} testId="inspector" notes={notes}>
        <SelectRow<Face>
          label="Face"
          value={o.face}
          readOnly={readOnly}
          testId={`field-openings.${i}.face`}
          options={FACES.map((f) => ({ value: f, label: FACE_LABEL[f] }))}
          onChange={(face) => editor.setOpeningFace(i, face)}
        />
        {FACE_COORDS[o.face].map((axis: Axis) => L(AXIS_WORD[axis], [...at, axis], o[axis], { allowZero: true }))}
        {o.type === 'driver' && (
          <>
            {L('Cut-out diameter', [...at, 'diameter'], o.diameter)}
            {N('Displacement', [...at, 'displacementLitres'], o.displacementLitres, 'L', { allowEmpty: false })}
            <OptionalPart
              label="Rebate for flush mounting"
              path={[...at, 'rebate']}
              value={o.rebate}
              make={() => defaultRebate(o)}
              editor={editor}
              readOnly={readOnly}
            >
              {(rebate) => (
                <>
                  {L('Rebate diameter', [...at, 'rebate', 'diameter'], rebate.diameter)}
                  {L('Rebate depth', [...at, 'rebate', 'depth'], rebate.depth)}
                </>
              )}
            </OptionalPart>
            <OptionalPart label="Screw holes" path={[...at, 'screwHoles']} value={o.screwHoles} make={() => defaultScrewHoles(o)} editor={editor} readOnly={readOnly}>
              {(screws) => (
                <>
                  {N('Count', [...at, 'screwHoles', 'count'], screws.count, undefined, { allowEmpty: false, integer: { min: 1, max: 24 } })}
                  {L('On a circle of', [...at, 'screwHoles', 'circleDiameter'], screws.circleDiameter)}
                  {L('Hole diameter', [...at, 'screwHoles', 'holeDiameter'], screws.holeDiameter)}
                </>
              )}
            </OptionalPart>
            <Group title={<span>For port air speed <span className="text-zinc-400">(optional)</span></span>}>
              {N('Cone area Sd', [...at, 'coneAreaCm2'], o.coneAreaCm2, 'cm²', { positive: true })}
              {N('Excursion Xmax', [...at, 'excursionMm'], o.excursionMm, 'mm', { positive: true })}
            </Group>
          </>
        )}
        {o.type === 'port' && (
          <>
            <SelectRow
              label="Shape"
              value={o.shape}
              readOnly={readOnly}
              testId={`field-openings.${i}.shape`}
              options={[
                { value: 'round', label: 'Round tube' },
                { value: 'slot', label: 'Slot' },
              ]}
              onChange={(shape) => editor.setField(at, withPortShape(doc, o, shape))}
            />
            {o.shape === 'slot' ? (
              <>
                {L('Slot width', [...at, 'width'], o.width)}
                {L('Slot height', [...at, 'height'], o.height)}
              </>
            ) : (
              <>
                {L('Inner diameter', [...at, 'diameter'], o.diameter)}
                {L('Tube wall', [...at, 'wall'], o.wall, { allowZero: true })}
              </>
            )}
            {L('Length', [...at, 'length'], o.length)}
            {N('Target tuning', [...at, 'targetHz'], o.targetHz, 'Hz', { positive: true })}
          </>
        )}
        {o.type === 'terminal' && (
          <>
            <SelectRow
              label="Cut-out"
              value={o.width !== undefined && o.height !== undefined ? 'rect' : 'round'}
              readOnly={readOnly}
              testId={`field-openings.${i}.cutout`}
              options={[
                { value: 'rect', label: 'Rectangular' },
                { value: 'round', label: 'Round' },
              ]}
              onChange={(shape) => editor.setField(at, withTerminalShape(o, shape))}
            />
            {o.width !== undefined && o.height !== undefined ? (
              <>
                {L('Width', [...at, 'width'], o.width)}
                {L('Height', [...at, 'height'], o.height)}
              </>
            ) : (
              L('Diameter', [...at, 'diameter'], o.diameter)
            )}
          </>
        )}
        {o.type === 'lead' && L('Diameter', [...at, 'diameter'], o.diameter)}
      </Section>
    );
  }

  const items = listItems(doc);
  const lining = doc.lining ?? null;
  return (
    <div className="space-y-5">
      <Section title="Box" testId="inspector" notes={notes}>
        {L('Outer width', ['outer', 'width'], doc.outer.width)}
        {L('Outer height', ['outer', 'height'], doc.outer.height)}
        {L('Outer depth', ['outer', 'depth'], doc.outer.depth)}
        {L('Panel thickness', ['material', 'thickness'], doc.material.thickness)}
        {L('Baffle thickness', ['baffleThickness'], doc.baffleThickness, { allowEmpty: true })}
      </Section>
      <Section
        title="Lining"
        action={
          <Toggle
            label="Line this box"
            quiet
            checked={lining !== null}
            readOnly={readOnly}
            testId="toggle-lining"
            onChange={(on) => editor.setField(['lining'], on ? liningSchema.parse({ thickness: 50 }) : null)}
          />
        }
      >
        {lining ? (
          <>
            {L('Thickness', ['lining', 'thickness'], lining.thickness)}
            {L('Crush allowance', ['lining', 'crush'], lining.crush, { allowZero: true })}
            {N('Fill density', ['lining', 'density'], lining.density, 'kg/m³', { allowEmpty: false, positive: true })}
            <fieldset className="pt-0.5">
              <legend className="mb-1 text-[13px] text-zinc-600">Faces lined</legend>
              <div className="grid grid-cols-2 gap-x-3 gap-y-1">
                {FACES.map((face) => (
                  <label key={face} className="flex cursor-pointer items-center gap-1.5 text-[12.5px] text-zinc-700 has-disabled:cursor-default">
                    <input
                      type="checkbox"
                      className="size-3.5 accent-accent-600"
                      checked={lining.faces.includes(face)}
                      disabled={readOnly}
                      data-testid={`toggle-lining-${face}`}
                      onChange={(e) => editor.setField(['lining'], withLinedFace(lining, face, e.target.checked))}
                    />
                    {FACE_LABEL[face]}
                  </label>
                ))}
              </div>
            </fieldset>
          </>
        ) : (
          <p className="text-[12.5px] text-zinc-500">No lining.</p>
        )}
      </Section>
      <Section title={`Items (${items.length})`}>
        {items.length === 0 ? (
          <p className="text-[12.5px] leading-snug text-zinc-500">
            {readOnly ? 'No braces or openings.' : 'No braces or openings yet: add them from the toolbar above the drawing.'}
          </p>
        ) : (
          <ul className="-mx-1" data-testid="inspector-items">
            {items.map((it) => (
              <li key={`${it.selection.kind}:${it.selection.index}`}>
                <button
                  type="button"
                  className="flex w-full items-baseline justify-between gap-2 rounded px-1 py-0.5 text-left text-[12.5px] text-zinc-800 hover:bg-zinc-100 focus-visible:outline-2 focus-visible:outline-accent-500"
                  onClick={() => editor.select(it.selection)}
                >
                  <span>{it.label}</span>
                  <span className="text-[11.5px] text-zinc-500">{it.detail}</span>
                </button>
              </li>
            ))}
          </ul>
        )}
        {!readOnly && (
          <p className="pt-1 text-[12px] leading-snug text-zinc-500">
            Drag the right, top or back edge of a drawing to resize. Select an item to move it; arrow keys nudge it (Shift: ×10).
            Lengths accept {units === 'in' ? `inches or mm (${formatLength(314.325, 'in')}, 314.5 mm)` : 'mm or inches (314.5, 12 3/8")'}.
          </p>
        )}
      </Section>
    </div>
  );
}

const AXES_OPTIONS: { value: Axis; label: string }[] = [
  { value: 'x', label: 'x (width)' },
  { value: 'y', label: 'y (height)' },
  { value: 'z', label: 'z (depth)' },
];
