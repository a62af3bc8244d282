/**
 * The konva view of the studio: three drawings to scale with dimension lines. Konva nodes are only a
 * view: pointer events go to the headless editor (its drag tool), which changes the design; this
 * component redraws from the editor's state. Coordinates are mapped to screen pixels here (not by a
 * konva scale), so lines stay one pixel wide and text stays legible at any zoom; konva renders at
 * devicePixelRatio, so it is crisp on high-DPI screens.
 */
import { useCallback, useEffect, useLayoutEffect, useMemo, useRef, useState, type ReactElement } from 'react';
import type Konva from 'konva';
import { Circle, Group, Label, Layer, Line, Rect, Stage, Tag, Text } from 'react-konva';
import type { Axis } from '../../../../shared/schemas/design.schema';
import type { EditorState, StudioEditor } from '../model/editor';
import { itemCoordMm, movableAxes, outerSizeMm } from '../model/geometry';
import type { UnitSystem, ViewName } from '../model/types';
import { formatLength } from '../model/units';
import { layoutViews, parseHit, projectView, VIEW_AXES, VIEW_TITLES, VIEWS, type HitId, type Prim } from '../model/views';
import { ACCENT, ACCENT_SOFT, CANVAS_BG, INK, MUTED, ROLE_STYLE, WARN } from './theme';

export interface StudioCanvasProps {
  editor: StudioEditor;
  state: EditorState;
  /** Warning messages by the item they are about. */
  warnings: Map<HitId, string[]>;
  /** Bumped by the toolbar's "Fit" button. */
  fitRequest: number;
}

const HIT_RE = /^(brace|opening|edge):/;
const DIM_GAP = 18;
const DIM_TIER = 20;
const FONT = 'DejaVu Sans, sans-serif';

/** Half-pixel alignment keeps 1 px lines on one device pixel row. */
const crisp = (v: number) => Math.round(v) + 0.5;

function selectionHit(state: EditorState): HitId | null {
  const s = state.selection;
  if (!s || s.kind === 'box') return null;
  return `${s.kind}:${s.index}` as HitId;
}

function cursorFor(hit: HitId, view: ViewName | null, state: EditorState): string {
  if (state.readOnly) return 'pointer';
  const p = parseHit(hit);
  if (p.kind === 'edge') return p.axis === (view ? VIEW_AXES[view].h : 'x') ? 'ew-resize' : 'ns-resize';
  const axes = movableAxes(state.doc, p);
  if (!view) return 'move';
  const { h, v } = VIEW_AXES[view];
  const canH = axes.includes(h);
  const canV = axes.includes(v);
  return canH && canV ? 'move' : canH ? 'ew-resize' : canV ? 'ns-resize' : 'pointer';
}

interface DimProps {
  /** Screen coordinates of the two measured points, and where the dimension line sits. */
  from: number;
  to: number;
  at: number;
  orientation: 'h' | 'v';
  /** Where the extension lines start (the object's edge), in the perpendicular screen axis. */
  base: number;
  text: string;
  color: string;
}

/** A dimension line with extension lines, end ticks and its value. */
function Dim({ from, to, at, orientation, base, text, color }: DimProps) {
  const a = Math.min(from, to);
  const b = Math.max(from, to);
  if (b - a < 2) return null;
  const tick = 4;
  const textWidth = 90;
  /** About the drawn width of the value at 11 px (DejaVu Sans averages ~0.6 em a character); its background hides lines behind it. */
  const labelWidth = Math.min(textWidth, text.length * 6.6 + 6);
  if (orientation === 'h') {
    const y = crisp(at);
    const dir = at > base ? 1 : -1;
    return (
      <Group listening={false}>
        <Line points={[crisp(a), base + dir * 3, crisp(a), y + dir * 4]} stroke={color} strokeWidth={0.75} opacity={0.7} />
        <Line points={[crisp(b), base + dir * 3, crisp(b), y + dir * 4]} stroke={color} strokeWidth={0.75} opacity={0.7} />
        <Line points={[a, y, b, y]} stroke={color} strokeWidth={1} />
        <Line points={[a - tick, y + tick, a + tick, y - tick]} stroke={color} strokeWidth={1} />
        <Line points={[b - tick, y + tick, b + tick, y - tick]} stroke={color} strokeWidth={1} />
        <Rect x={(a + b) / 2 - labelWidth / 2} y={dir > 0 ? y + 2 : y - 16} width={labelWidth} height={14} fill={CANVAS_BG} />
        <Text
          x={(a + b) / 2 - textWidth / 2}
          y={dir > 0 ? y + 3 : y - 15}
          width={textWidth}
          align="center"
          text={text}
          fontSize={11}
          fontFamily={FONT}
          fill={color}
        />
      </Group>
    );
  }
  const x = crisp(at);
  const dir = at > base ? 1 : -1;
  return (
    <Group listening={false}>
      <Line points={[base + dir * 3, crisp(a), x + dir * 4, crisp(a)]} stroke={color} strokeWidth={0.75} opacity={0.7} />
      <Line points={[base + dir * 3, crisp(b), x + dir * 4, crisp(b)]} stroke={color} strokeWidth={0.75} opacity={0.7} />
      <Line points={[x, a, x, b]} stroke={color} strokeWidth={1} />
      <Line points={[x - tick, a + tick, x + tick, a - tick]} stroke={color} strokeWidth={1} />
      <Line points={[x - tick, b + tick, x + tick, b - tick]} stroke={color} strokeWidth={1} />
      <Rect x={dir > 0 ? x + 2 : x - 16} y={(a + b) / 2 - labelWidth / 2} width={14} height={labelWidth} fill={CANVAS_BG} />
      <Text
        x={dir > 0 ? x + 3 : x - 15}
        y={(a + b) / 2 + textWidth / 2}
        width={textWidth}
        align="center"
        rotation={-90}
        text={text}
        fontSize={11}
        fontFamily={FONT}
        fill={color}
      />
    </Group>
  );
}

export function StudioCanvas({ editor, state, warnings, fitRequest }: StudioCanvasProps) {
  const containerRef = useRef<HTMLDivElement>(null);
  const [size, setSize] = useState({ width: 0, height: 0 });
  const [hover, setHover] = useState<{ hit: HitId; view: ViewName } | null>(null);
  const fittedRef = useRef(false);
  /** The camera of the last fit; once the user zooms or pans, the view is theirs and is not refitted. */
  const fitCamera = useRef<EditorState['camera'] | null>(null);
  const { doc, camera, units } = state;

  useLayoutEffect(() => {
    const el = containerRef.current;
    if (!el) return;
    const measure = () => setSize({ width: el.clientWidth, height: el.clientHeight });
    measure();
    const ro = new ResizeObserver(measure);
    ro.observe(el);
    return () => ro.disconnect();
  }, []);

  // Fit once the size is known, and whenever the toolbar asks.
  useEffect(() => {
    if (size.width === 0 || size.height === 0) return;
    if (!fittedRef.current || fitRequest > 0) {
      editor.fitToView(size);
      fittedRef.current = true;
      fitCamera.current = editor.getState().camera;
    }
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [fitRequest, size.width > 0 && size.height > 0]);

  const layout = useMemo(() => layoutViews(doc), [doc]);

  // When the box changes size outside a drag (a typed value, the form) and no longer fits, fit again,
  // unless the user has zoomed or panned since the last fit.
  const idle = state.tool.name === 'idle';
  useEffect(() => {
    if (!idle || size.width === 0 || !fittedRef.current || editor.getState().camera !== fitCamera.current) return;
    const b = layout.bounds;
    const a = editor.worldToScreen({ x: b.minX, y: b.maxY });
    const c = editor.worldToScreen({ x: b.maxX, y: b.minY });
    if (a.x < -1 || a.y < -1 || c.x > size.width + 1 || c.y > size.height + 1) {
      editor.fitToView(size);
      fitCamera.current = editor.getState().camera;
    }
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [doc.outer, idle]);
  const prims = useMemo(() => Object.fromEntries(VIEWS.map((v) => [v, projectView(doc, v)])) as Record<ViewName, Prim[]>, [doc]);

  const localPoint = useCallback((e: { clientX: number; clientY: number }) => {
    const r = containerRef.current!.getBoundingClientRect();
    return { x: e.clientX - r.left, y: e.clientY - r.top };
  }, []);

  // While a press is held, follow the pointer anywhere on the page.
  useEffect(() => {
    if (state.tool.name === 'idle') return;
    const move = (e: PointerEvent) => editor.pointerMove({ screen: localPoint(e) });
    const up = (e: PointerEvent) => editor.pointerUp({ screen: localPoint(e) });
    window.addEventListener('pointermove', move);
    window.addEventListener('pointerup', up);
    window.addEventListener('pointercancel', up);
    return () => {
      window.removeEventListener('pointermove', move);
      window.removeEventListener('pointerup', up);
      window.removeEventListener('pointercancel', up);
    };
  }, [state.tool.name, editor, localPoint]);

  const onPointerDown = (e: Konva.KonvaEventObject<PointerEvent>) => {
    const name = e.target.name();
    const hit = HIT_RE.test(name) ? (name as HitId) : null;
    containerRef.current?.focus({ preventScroll: true });
    editor.pointerDown({ screen: localPoint(e.evt), hit, button: e.evt.button });
  };

  const onWheel = (e: Konva.KonvaEventObject<WheelEvent>) => {
    e.evt.preventDefault();
    const factor = Math.exp(-e.evt.deltaY * (e.evt.deltaMode === 1 ? 0.05 : 0.0015));
    editor.zoomAt(localPoint(e.evt), factor);
  };

  const selected = selectionHit(state);
  const toScreen = (view: ViewName, h: number, v: number) => {
    const l = layout.views[view];
    return { x: camera.x + (l.ox + h) * camera.zoom, y: camera.y - (l.oy + v) * camera.zoom };
  };

  const dragging = state.tool.name === 'dragging' ? state.tool : null;
  const cursor =
    state.tool.name === 'panning'
      ? 'grabbing'
      : dragging
        ? cursorFor(dragging.hit, dragging.view, state)
        : hover
          ? cursorFor(hover.hit, hover.view, state)
          : 'default';

  const drawPrim = (view: ViewName, p: Prim, key: string) => {
    const style = ROLE_STYLE[p.role];
    const isSel = p.hit !== undefined && (p.hit === selected || (p.hit.startsWith('edge:') && state.selection?.kind === 'box'));
    const isHover = p.hit !== undefined && p.hit === hover?.hit;
    const warned = p.hit !== undefined && warnings.has(p.hit);
    const stroke = isSel ? ACCENT : warned ? WARN : style.stroke;
    const strokeWidth = isSel || warned ? Math.max(1.5, style.strokeWidth + 0.75) : isHover ? style.strokeWidth + 0.75 : style.strokeWidth;
    const common = {
      name: p.hit ?? '',
      listening: p.hit !== undefined,
      stroke,
      strokeWidth,
      dash: p.dashed ? [5, 4] : undefined,
      opacity: p.dashed && !isSel ? 0.75 : 1,
      onMouseEnter: p.hit ? () => setHover({ hit: p.hit!, view }) : undefined,
      onMouseLeave: p.hit ? () => setHover((h) => (h?.hit === p.hit ? null : h)) : undefined,
    };
    if (p.kind === 'rect') {
      const a = toScreen(view, p.x, p.y + p.h);
      const w = p.w * camera.zoom;
      const h = p.h * camera.zoom;
      const fill = isSel && style.fill ? style.fill : style.fill;
      return (
        <Rect
          key={key}
          {...common}
          x={crisp(a.x)}
          y={crisp(a.y)}
          width={Math.max(1, Math.round(w))}
          height={Math.max(1, Math.round(h))}
          fill={p.dashed && p.role !== 'window' ? undefined : fill}
          hitStrokeWidth={8}
        />
      );
    }
    if (p.kind === 'circle') {
      const c = toScreen(view, p.cx, p.cy);
      return <Circle key={key} {...common} x={c.x} y={c.y} radius={Math.max(1, p.r * camera.zoom)} fill={p.dashed ? undefined : style.fill} hitStrokeWidth={8} />;
    }
    const a = toScreen(view, p.points[0], p.points[1]);
    const b = toScreen(view, p.points[2], p.points[3]);
    const edgeSel = p.role === 'edge' && (isHover || isSel);
    return (
      <Line
        key={key}
        {...common}
        points={[crisp(a.x), crisp(a.y), crisp(b.x), crisp(b.y)]}
        stroke={edgeSel && !state.readOnly ? ACCENT : 'rgba(0,0,0,0)'}
        strokeWidth={edgeSel ? 3 : 1}
        hitStrokeWidth={12}
        listening={!state.readOnly || p.role !== 'edge'}
      />
    );
  };

  const fmt = (mm: number) => formatLength(mm, units);

  const drawDims = (view: ViewName) => {
    const l = layout.views[view];
    const { h: ha, v: va } = VIEW_AXES[view];
    const p0 = toScreen(view, 0, 0);
    const p1 = toScreen(view, l.w, l.h);
    const hBelow = true;
    const vRight = view !== 'front';
    const hAt = (tier: number) => (hBelow ? p0.y + DIM_GAP + tier * DIM_TIER : p1.y - DIM_GAP - tier * DIM_TIER);
    const vAt = (tier: number) => (vRight ? p1.x + DIM_GAP + tier * DIM_TIER : p0.x - DIM_GAP - tier * DIM_TIER);
    const out: ReactElement[] = [];
    // The selection's distance from the box's origin edges, on the axes this view shows.
    const sel = state.selection;
    if (sel && sel.kind !== 'box') {
      const hv = (axis: Axis) => itemCoordMm(doc, sel, axis);
      const ch = hv(ha);
      const cv = hv(va);
      if (ch !== null && movableAxes(doc, sel).includes(ha)) {
        const x = toScreen(view, ch, 0).x;
        out.push(<Dim key="sh" from={p0.x} to={x} at={hAt(1)} base={hBelow ? p0.y : p1.y} orientation="h" text={fmt(ch)} color={ACCENT} />);
      }
      if (cv !== null && movableAxes(doc, sel).includes(va)) {
        const y = toScreen(view, 0, cv).y;
        out.push(<Dim key="sv" from={p0.y} to={y} at={vAt(1)} base={vRight ? p1.x : p0.x} orientation="v" text={fmt(cv)} color={ACCENT} />);
      }
    }
    // The outer sizes last: their labels sit over the selection's extension lines, as a drawing breaks a line at a value.
    out.push(
      <Dim key="h" from={p0.x} to={p1.x} at={hAt(0)} base={hBelow ? p0.y : p1.y} orientation="h" text={fmt(outerSizeMm(doc, ha))} color={INK} />,
      <Dim key="v" from={p0.y} to={p1.y} at={vAt(0)} base={vRight ? p1.x : p0.x} orientation="v" text={fmt(outerSizeMm(doc, va))} color={INK} />,
    );
    return out;
  };

  const drawBadges = (view: ViewName) => {
    const seen = new Set<string>();
    const out: ReactElement[] = [];
    for (const p of prims[view]) {
      if (!p.hit || !warnings.has(p.hit) || seen.has(p.hit)) continue;
      seen.add(p.hit);
      const corner =
        p.kind === 'rect' ? toScreen(view, p.x + p.w, p.y + p.h) : p.kind === 'circle' ? toScreen(view, p.cx + p.r * 0.71, p.cy + p.r * 0.71) : null;
      if (!corner) continue;
      out.push(
        <Group key={`w-${p.hit}`} x={corner.x + 2} y={corner.y - 2} listening={false}>
          <Circle radius={8} fill={WARN} />
          <Text x={-4} y={-6} width={8} align="center" text="!" fontSize={12} fontStyle="bold" fontFamily={FONT} fill="#fff" />
        </Group>,
      );
    }
    return out;
  };

  /** The hovered item's warnings, in a small note beside it. */
  const drawWarningNote = () => {
    if (!hover || !warnings.has(hover.hit) || state.tool.name !== 'idle') return null;
    const p = prims[hover.view].find((q) => q.hit === hover.hit && q.kind !== 'line');
    if (!p) return null;
    const at = p.kind === 'rect' ? toScreen(hover.view, p.x + p.w, p.y + p.h) : p.kind === 'circle' ? toScreen(hover.view, p.cx + p.r, p.cy + p.r * 0.71) : null;
    if (!at) return null;
    const text = warnings.get(hover.hit)!.join('\n');
    const width = 260;
    const x = Math.min(at.x + 14, size.width - width - 8);
    return (
      <Label x={x} y={Math.max(8, at.y - 4)} listening={false}>
        <Tag fill="#fff8f1" stroke={WARN} strokeWidth={1} cornerRadius={4} shadowColor="#000" shadowOpacity={0.08} shadowBlur={6} />
        <Text padding={8} width={width} text={text} fontSize={11.5} lineHeight={1.3} fontFamily={FONT} fill="#7c2d12" />
      </Label>
    );
  };

  const drawGuides = () =>
    state.guides.map((g, i) => {
      const l = layout.views[g.view];
      const { h } = VIEW_AXES[g.view];
      const pad = 12 / camera.zoom;
      const pts =
        g.axis === h
          ? [toScreen(g.view, g.valueMm, -pad), toScreen(g.view, g.valueMm, l.h + pad)]
          : [toScreen(g.view, -pad, g.valueMm), toScreen(g.view, l.w + pad, g.valueMm)];
      return <Line key={`g${i}`} points={[crisp(pts[0]!.x), crisp(pts[0]!.y), crisp(pts[1]!.x), crisp(pts[1]!.y)]} stroke={ACCENT} strokeWidth={1} dash={[3, 3]} listening={false} />;
    });

  const drawTitle = (view: ViewName) => {
    const l = layout.views[view];
    const atTop = true;
    const p = toScreen(view, 0, l.h);
    const active = state.activeView === view;
    return (
      <Text
        key={`t-${view}`}
        x={p.x}
        y={atTop ? p.y - 20 : p.y + 8}
        text={VIEW_TITLES[view].toUpperCase()}
        fontSize={11}
        letterSpacing={1.2}
        fontFamily={FONT}
        fontStyle={active ? 'bold' : 'normal'}
        fill={active ? INK : MUTED}
        listening={false}
      />
    );
  };

  return (
    <div
      ref={containerRef}
      className="relative h-full w-full outline-none after:pointer-events-none after:absolute after:inset-0 after:content-[''] focus-visible:after:ring-2 focus-visible:after:ring-accent-400 focus-visible:after:ring-inset"
      style={{ background: CANVAS_BG, cursor }}
      tabIndex={0}
      data-testid="studio-canvas"
      data-camera={JSON.stringify(camera)}
      aria-label="Cabinet drawing: front, side section and top section"
    >
      {size.width > 0 && size.height > 0 && (
        <Stage width={size.width} height={size.height} onPointerDown={onPointerDown} onWheel={onWheel}>
          <Layer>
            {VIEWS.map((view) => (
              <Group key={view}>
                {prims[view].map((p, i) => drawPrim(view, p, `${view}-${i}`))}
                {drawDims(view)}
                {drawBadges(view)}
                {drawTitle(view)}
              </Group>
            ))}
            {drawGuides()}
            {drawWarningNote()}
            {state.selection?.kind === 'box' && (
              <Rect
                listening={false}
                x={crisp(toScreen('front', 0, doc.outer.height).x)}
                y={crisp(toScreen('front', 0, doc.outer.height).y)}
                width={Math.round(doc.outer.width * camera.zoom)}
                height={Math.round(doc.outer.height * camera.zoom)}
                stroke={ACCENT}
                strokeWidth={1.5}
                fill={ACCENT_SOFT}
                opacity={0.5}
              />
            )}
          </Layer>
        </Stage>
      )}
    </div>
  );
}
