/**
 * Every lining piece laid flat, with its holes and notches, name and cut size, grouped by the face it
 * lines, all drawn at one common scale so their sizes compare at a glance.
 */
import type { Face } from '../../../../shared/schemas/design.schema';
import type { LiningPiecePlan, Point } from '../../../../shared/schemas/plan.types';
import type { UnitSystem } from '../model/types';
import { formatLength } from '../model/units';

const FACE_ORDER: Face[] = ['back', 'left', 'right', 'top', 'bottom', 'front'];
const FACE_TITLE: Record<Face, string> = { back: 'Back', left: 'Left side', right: 'Right side', top: 'Top', bottom: 'Bottom', front: 'Front' };

export interface LiningViewProps {
  pieces: LiningPiecePlan[];
  units: UnitSystem;
  stale: boolean;
}

function pathOf(points: Point[], scale: number, h: number): string {
  return points.map(([x, y], i) => `${i === 0 ? 'M' : 'L'}${(x * scale).toFixed(2)},${((h - y) * scale).toFixed(2)}`).join(' ') + ' Z';
}

export function LiningView({ pieces, units, stale }: LiningViewProps) {
  if (pieces.length === 0) {
    return <p className="p-6 text-[13px] text-zinc-500">No lining pieces: this design has no lining, or no lined face.</p>;
  }
  const maxDim = Math.max(...pieces.map((p) => Math.max(p.width, p.height)));
  const scale = Math.min(0.9, 210 / maxDim);
  const pad = 22;
  return (
    <div className={`space-y-5 p-5 ${stale ? 'opacity-45 grayscale' : ''}`} data-testid="lining-view">
      <p className="max-w-3xl text-[12.5px] leading-snug text-zinc-600">
        Cut sizes include the crush allowance. Drawn at about 1 : {Math.round(3.7795 / scale)} on screen; print full-size stencils
        from the cut plan. Glass and mineral wool irritate skin, eyes and airways: if you line with them, wear gloves, long
        sleeves and a mask, and follow your local health-and-safety rules.
      </p>
      <div className="flex flex-wrap items-start gap-x-8 gap-y-5">
        {FACE_ORDER.filter((face) => pieces.some((p) => p.face === face)).map((face) => (
          <section key={face} aria-label={`${FACE_TITLE[face]} lining`}>
            <h3 className="mb-2 text-[11px] font-bold uppercase tracking-wider text-zinc-500">{FACE_TITLE[face]}</h3>
            <div className="flex flex-wrap items-end gap-4">
              {pieces
                .filter((p) => p.face === face)
                .map((p, i) => {
                  const w = p.width * scale;
                  const h = p.height * scale;
                  return (
                    <figure key={`${p.name}-${i}`} className="rounded border border-zinc-200 bg-white p-2" data-testid="lining-piece" data-name={p.name} data-width={p.width} data-height={p.height}>
                      <svg width={w + pad + 4} height={h + pad + 4} role="img" aria-label={`${p.name}, ${formatLength(p.width, units)} by ${formatLength(p.height, units)}`}>
                        <g transform={`translate(${pad},2)`}>
                          <path
                            d={[pathOf(p.outline, scale, p.height), ...p.holes.map((hole) => pathOf(hole, scale, p.height))].join(' ')}
                            fillRule="evenodd"
                            fill="rgba(222, 190, 110, 0.35)"
                            stroke="#9c7b2e"
                            strokeWidth={1}
                          />
                          <line x1={0} y1={h + 8} x2={w} y2={h + 8} stroke="#8a847b" strokeWidth={0.75} />
                          <text x={w / 2} y={h + 19} textAnchor="middle" fontSize={10} fill="#57534e">
                            {formatLength(p.width, units)}
                          </text>
                          <line x1={-8} y1={0} x2={-8} y2={h} stroke="#8a847b" strokeWidth={0.75} />
                          <text x={-11} y={h / 2} textAnchor="middle" fontSize={10} fill="#57534e" transform={`rotate(-90 ${-11} ${h / 2})`}>
                            {formatLength(p.height, units)}
                          </text>
                        </g>
                      </svg>
                      <figcaption className="mt-1 text-[12px] leading-tight">
                        <span className="font-bold text-zinc-800" data-testid="lining-piece-name">{p.name}</span>
                        {p.quantity > 1 && <span className="text-zinc-500"> × {p.quantity}</span>}
                        <br />
                        <span className="font-mono text-[11.5px] text-zinc-600" data-testid="lining-piece-size">
                          {formatLength(p.width, units, { unit: false })} × {formatLength(p.height, units)}
                        </span>
                        <span className="text-zinc-400"> · {(p.area / 1e6).toFixed(3)} m²</span>
                        {p.holes.length > 0 && <span className="text-zinc-400"> · {p.holes.length} hole{p.holes.length > 1 ? 's' : ''}</span>}
                      </figcaption>
                    </figure>
                  );
                })}
            </div>
          </section>
        ))}
      </div>
    </div>
  );
}
