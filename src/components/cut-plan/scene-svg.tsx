import type { ReactNode } from 'react';
import type { Prim } from '../../../shared/render/scene';

const ANCHOR = { left: 'start', center: 'middle', right: 'end' } as const;

function paint(p: { fill?: string; stroke?: { color: string; widthMm: number; dashMm?: readonly [number, number] } }) {
  return {
    fill: p.fill ?? 'none',
    ...(p.stroke
      ? { stroke: p.stroke.color, strokeWidth: p.stroke.widthMm, ...(p.stroke.dashMm ? { strokeDasharray: `${p.stroke.dashMm[0]} ${p.stroke.dashMm[1]}` } : {}) }
      : {}),
  };
}

function renderPrims(prims: readonly Prim[], key: string): ReactNode[] {
  return prims.map((p, i) => {
    const k = `${key}-${i}`;
    switch (p.kind) {
      case 'rect':
        return <rect key={k} x={p.x} y={p.y} width={p.w} height={p.h} {...paint(p)} />;
      case 'circle':
        return <circle key={k} cx={p.cx} cy={p.cy} r={p.r} {...paint(p)} />;
      case 'poly': {
        const points = p.points.map(([x, y]) => `${x},${y}`).join(' ');
        return p.closed ? <polygon key={k} points={points} {...paint(p)} /> : <polyline key={k} points={points} {...paint(p)} />;
      }
      case 'text':
        return (
          <text key={k} x={p.x} y={p.y} fontSize={p.sizeMm} fontWeight={p.font === 'bold' ? 700 : 400} textAnchor={ANCHOR[p.align]} fill={p.color}>
            {p.text}
          </text>
        );
      case 'clip':
        return (
          <svg key={k} x={p.x} y={p.y} width={p.w} height={p.h} viewBox={`${p.x} ${p.y} ${p.w} ${p.h}`} overflow="hidden">
            {renderPrims(p.items, k)}
          </svg>
        );
    }
  });
}

/** A scene of shared/render (mm, y down) as inline SVG, scaled to the width it is given. */
export function SceneSvg({ prims, widthMm, heightMm, title, className }: { prims: readonly Prim[]; widthMm: number; heightMm: number; title: string; className?: string }) {
  return (
    <svg viewBox={`0 0 ${widthMm} ${heightMm}`} role="img" aria-label={title} className={className} style={{ fontFamily: 'DejaVu Sans, Verdana, sans-serif' }}>
      <title>{title}</title>
      {renderPrims(prims, 'p')}
    </svg>
  );
}
