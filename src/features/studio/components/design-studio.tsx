/**
 * The design studio: the canvas with its three drawings, a small palette, the selected item's values,
 * live figures from the cabinet engine and the lining laid flat. The design JSON is the one document;
 * the page passes it in and hears about every committed change through onChange.
 */
import { useEffect, useMemo, useRef, useState } from 'react';
import { BRACE_KINDS, OPENING_KINDS } from '../model/commands';
import { StudioEditor } from '../model/editor';
import { diffDesigns } from '../model/diff';
import { EMPTY_FIGURES, nextFigures, type FiguresState, type PlanOutcome } from '../model/figures';
import { describeField, plainMessage } from '../model/items';
import { planDesign } from '../model/plan';
import { GRIDS, type GridId } from '../model/snapping';
import type { StudioDoc, UnitSystem } from '../model/types';
import { hitForField, type HitId } from '../model/views';
import { FiguresPanel, FiguresStrip } from './figures-panel';
import { Inspector, type ItemNote } from './inspector';
import { LiningView } from './lining-view';
import { StudioCanvas } from './studio-canvas';
import { useEditorState } from './use-editor';

export interface DesignStudioProps {
  design: StudioDoc;
  readOnly: boolean;
  units: UnitSystem;
  /** Called once per committed change (a drag when it ends, a typed value, a palette click, undo/redo). */
  onChange(design: StudioDoc): void;
  onUnitsChange(units: UnitSystem): void;
  className?: string;
}

type Tab = 'drawing' | 'lining';

const isTyping = (t: EventTarget | null) =>
  t instanceof HTMLElement && (t.isContentEditable || ['INPUT', 'SELECT', 'TEXTAREA'].includes(t.tagName) || !!t.closest('dialog'));

function ToolButton(props: React.ButtonHTMLAttributes<HTMLButtonElement> & { pressed?: boolean }) {
  const { pressed, className, ...rest } = props;
  return (
    <button
      type="button"
      aria-pressed={pressed}
      className={`h-7 rounded px-2 text-[12.5px] text-zinc-700 hover:bg-zinc-100 disabled:text-zinc-300 disabled:hover:bg-transparent ${
        pressed ? 'bg-zinc-200/70 font-bold text-zinc-900' : ''
      } ${className ?? ''}`}
      {...rest}
    />
  );
}

interface SegmentedProps<T extends string> {
  role: 'tablist' | 'radiogroup';
  label?: string;
  options: { value: T; label: string }[];
  value: T;
  onChange(value: T): void;
  tone: 'dark' | 'accent';
  className?: string;
}

/** A small segmented switch: the Drawing/Lining tabs and the mm/in choice. */
function Segmented<T extends string>({ role, label, options, value, onChange, tone, className }: SegmentedProps<T>) {
  const on = tone === 'dark' ? 'bg-zinc-800 text-white' : 'bg-accent-600 text-white';
  return (
    <div className={`flex rounded border border-zinc-200 bg-white p-0.5 ${className ?? ''}`} role={role} aria-label={label}>
      {options.map((o) => {
        const active = o.value === value;
        return (
          <button
            key={o.value}
            type="button"
            role={role === 'tablist' ? 'tab' : 'radio'}
            aria-selected={role === 'tablist' ? active : undefined}
            aria-checked={role === 'radiogroup' ? active : undefined}
            onClick={() => onChange(o.value)}
            className={`h-6 rounded-sm px-2.5 text-[12.5px] ${active ? on : 'text-zinc-600 hover:bg-zinc-100'}`}
          >
            {o.label}
          </button>
        );
      })}
    </div>
  );
}

function Divider() {
  return <span aria-hidden className="mx-1 h-5 w-px bg-zinc-200" />;
}

export function DesignStudio({ design, readOnly, units, onChange, onUnitsChange, className }: DesignStudioProps) {
  const onChangeRef = useRef(onChange);
  onChangeRef.current = onChange;
  const emitted = useRef<StudioDoc | null>(null);
  const [editor] = useState(
    () =>
      new StudioEditor(design, {
        readOnly,
        units,
        grid: units === 'in' ? 'in16' : 'mm1',
        onCommit: (doc) => {
          emitted.current = doc;
          onChangeRef.current(doc);
        },
      }),
  );
  const state = useEditorState(editor);
  const [tab, setTab] = useState<Tab>('drawing');
  const [fitRequest, setFitRequest] = useState(0);

  // The page's design is the source when it changes from outside (the side form, a reload).
  // A design equal to ours in every field (the form hands back a re-parsed copy of what we emitted) is ignored.
  useEffect(() => {
    if (design === emitted.current || design === editor.doc) return;
    if (diffDesigns(editor.doc, design).length === 0) return;
    editor.replaceDoc(design);
  }, [design, editor]);
  useEffect(() => editor.setReadOnly(readOnly), [readOnly, editor]);
  useEffect(() => {
    editor.setUnits(units);
    const g = editor.getState().grid;
    if (units === 'in' && g.startsWith('mm')) editor.setGrid('in16');
    if (units === 'mm' && g === 'in16') editor.setGrid('mm1');
  }, [units, editor]);

  // Live figures: the engine runs on every change of the document; errors keep the last good figures.
  const figuresRef = useRef<FiguresState>(EMPTY_FIGURES);
  const outcome = useMemo<PlanOutcome>(() => planDesign(state.doc) as PlanOutcome, [state.doc]);
  const figures = useMemo(() => (figuresRef.current = nextFigures(figuresRef.current, state.doc, outcome)), [outcome, state.doc]);
  const lastPlan = useRef(outcome.ok ? outcome.plan : null);
  if (outcome.ok) lastPlan.current = outcome.plan;

  // Messages about items, drawn where the items are: the engine's errors while the design cannot be
  // planned, its warnings otherwise.
  const notes = useMemo(() => {
    const m = new Map<HitId, ItemNote[]>();
    const add = (field: string | undefined, note: ItemNote) => {
      const hit = hitForField(field);
      if (hit) m.set(hit, [...(m.get(hit) ?? []), note]);
    };
    if (figures.error) for (const [f, msg] of Object.entries(figures.error.fields)) add(f, { tone: 'error', text: plainMessage(state.doc, msg) });
    else for (const w of figures.figures?.warnings ?? []) add(w.field, { tone: 'warn', text: plainMessage(state.doc, w.message) });
    return m;
  }, [figures, state.doc]);
  const warnings = useMemo(() => new Map([...notes].map(([hit, list]) => [hit, list.map((n) => n.text)])), [notes]);

  // Keys: when the studio has the focus (or nothing does), never while typing in a field or a dialog.
  const rootRef = useRef<HTMLDivElement>(null);
  useEffect(() => {
    const down = (e: KeyboardEvent) => {
      const undoKey = (e.ctrlKey || e.metaKey) && ['z', 'y'].includes(e.key.toLowerCase());
      if (undoKey && e.target instanceof HTMLElement && e.target.dataset.pristine && rootRef.current?.contains(e.target)) {
        // In an inspector box with nothing typed since its value was shown (after Enter), undo is the studio's.
        if (editor.keyDown(e)) e.preventDefault();
        return;
      }
      if (isTyping(e.target) || tab !== 'drawing') return;
      const inStudio = e.target === document.body || (e.target instanceof Node && !!rootRef.current?.contains(e.target));
      if (!inStudio) return;
      if (editor.keyDown(e)) e.preventDefault();
    };
    const up = (e: KeyboardEvent) => editor.keyUp(e);
    window.addEventListener('keydown', down);
    window.addEventListener('keyup', up);
    return () => {
      window.removeEventListener('keydown', down);
      window.removeEventListener('keyup', up);
    };
  }, [editor, tab]);

  const sel = state.selection;
  // A new selection shows its values at the top of the side panel.
  const asideRef = useRef<HTMLElement>(null);
  const selKey = sel === null ? 'none' : sel.kind === 'box' ? 'box' : `${sel.kind}:${sel.index}`;
  useEffect(() => {
    asideRef.current?.scrollTo({ top: 0 });
  }, [selKey]);
  const selHit = sel && sel.kind !== 'box' ? (`${sel.kind}:${sel.index}` as HitId) : null;
  const showField = (field: string | undefined) => {
    const hit = hitForField(field);
    if (!hit) return;
    const [kind, index] = hit.split(':') as ['brace' | 'opening', string];
    setTab('drawing');
    editor.select({ kind, index: Number(index) });
  };
  const scale = 3.7795 / state.camera.zoom; // CSS px per mm at 96 dpi (CSS Values 4: 1 in = 96 px)

  return (
    <div
      ref={rootRef}
      className={`flex flex-col overflow-hidden rounded-lg border border-zinc-200 bg-white ${className ?? 'h-[clamp(520px,calc(100vh-13rem),960px)]'}`}
      data-testid="design-studio"
      data-readonly={readOnly || undefined}
    >
      <div className="flex min-h-11 flex-wrap items-center gap-0.5 border-b border-zinc-200 bg-zinc-50/80 px-2 py-1" role="toolbar" aria-label="Studio">
        <Segmented<Tab>
          className="mr-1"
          role="tablist"
          options={[
            { value: 'drawing', label: 'Drawing' },
            { value: 'lining', label: 'Lining' },
          ]}
          value={tab}
          onChange={setTab}
          tone="dark"
        />
        {!readOnly && tab === 'drawing' && (
          <>
            <Divider />
            <span className="px-1 text-[11px] font-bold uppercase tracking-wider text-zinc-400">Add</span>
            {BRACE_KINDS.map((b) => (
              <ToolButton key={b.kind} onClick={() => editor.addBrace(b.kind)} title={`Add a ${b.label.toLowerCase()}`}>
                {b.label}
              </ToolButton>
            ))}
            <span aria-hidden className="mx-0.5 text-zinc-300">·</span>
            {OPENING_KINDS.map((o) => (
              <ToolButton key={o.kind} onClick={() => editor.addOpening(o.kind)} title={`Add a ${o.label.toLowerCase()}`}>
                {o.label}
              </ToolButton>
            ))}
            <Divider />
            <ToolButton onClick={() => editor.deleteSelection()} disabled={!selHit} title="Delete the selection (Delete)">
              Delete
            </ToolButton>
            <ToolButton onClick={() => editor.undo()} disabled={state.history.undo.length === 0} title="Undo (Ctrl+Z)">
              Undo
            </ToolButton>
            <ToolButton onClick={() => editor.redo()} disabled={state.history.redo.length === 0} title="Redo (Ctrl+Shift+Z)">
              Redo
            </ToolButton>
          </>
        )}
        <div className="ml-auto flex items-center gap-1.5">
          {readOnly && (
            <span className="rounded bg-zinc-100 px-2 py-0.5 text-[11.5px] text-zinc-600" data-testid="studio-readonly">
              View only
            </span>
          )}
          {tab === 'drawing' && (
            <>
              {!readOnly && (
                <label className="flex items-center gap-1 text-[12px] text-zinc-500">
                  Snap
                  <select
                    className="h-7 rounded border border-zinc-300 bg-white px-1 text-[12.5px] text-zinc-800"
                    value={state.grid}
                    onChange={(e) => editor.setGrid(e.target.value as GridId)}
                    aria-label="Snap grid"
                  >
                    {GRIDS.map((g) => (
                      <option key={g.id} value={g.id}>
                        {g.label}
                      </option>
                    ))}
                  </select>
                </label>
              )}
              <ToolButton onClick={() => setFitRequest((n) => n + 1)} title="Fit the drawings to the window">
                Fit
              </ToolButton>
              <span className="w-14 text-right font-mono text-[11.5px] tabular-nums text-zinc-500" title="Scale on screen at 96 px per inch">
                1:{scale >= 10 ? Math.round(scale) : scale.toFixed(1)}
              </span>
            </>
          )}
          {tab === 'drawing' && <Divider />}
          <Segmented<UnitSystem>
            role="radiogroup"
            label="Units"
            options={[
              { value: 'mm', label: 'mm' },
              { value: 'in', label: 'in' },
            ]}
            value={units}
            onChange={onUnitsChange}
            tone="accent"
          />
        </div>
      </div>
      <div className="flex min-h-0 flex-1">
        <div className="flex min-w-0 flex-1 flex-col">
          <div className="relative min-h-0 flex-1">
            {tab === 'drawing' ? (
              <>
                <StudioCanvas editor={editor} state={state} warnings={warnings} fitRequest={fitRequest} />
                <p className="pointer-events-none absolute top-2 left-3 text-[11.5px] text-zinc-500">
                  {readOnly
                    ? 'Wheel zooms · drag the background to pan'
                    : 'Drag to move or resize · arrows nudge (Shift ×10) · wheel zooms · drag the background or hold Space to pan'}
                </p>
              </>
            ) : (
              <div className="h-full overflow-auto bg-zinc-50/60">
                <LiningView pieces={lastPlan.current?.liningPieces ?? []} units={units} stale={figures.stale} />
              </div>
            )}
          </div>
          <FiguresStrip
            state={figures}
            describeField={(field) => describeField(state.doc, field)}
            plainMessage={(text) => plainMessage(state.doc, text)}
            onShowField={showField}
            onShowWarnings={() => {
              const aside = asideRef.current;
              const list = aside?.querySelector('#studio-warnings');
              if (aside && list instanceof HTMLElement) aside.scrollTo({ top: list.offsetTop - aside.offsetTop - 8, behavior: 'smooth' });
            }}
          />
        </div>
        <aside ref={asideRef} className="relative w-[19.5rem] shrink-0 space-y-5 overflow-y-auto border-l border-zinc-200 bg-white px-4 py-3" aria-label="Selection and figures">
          <Inspector
            editor={editor}
            doc={state.doc}
            selection={sel}
            units={units}
            readOnly={readOnly}
            messages={selHit ? notes.get(selHit) ?? [] : []}
          />
          <div className="border-t border-zinc-200 pt-3">
            <FiguresPanel
              state={figures}
              units={units}
              readOnly={readOnly}
              describeField={(field) => describeField(state.doc, field)}
              plainMessage={(text) => plainMessage(state.doc, text)}
              onApplyPortLength={(mm) => editor.applyPortLength(figures.figures?.port?.portIndexes ?? [], mm)}
              onShowField={showField}
            />
          </div>
        </aside>
      </div>
    </div>
  );
}

export default DesignStudio;
