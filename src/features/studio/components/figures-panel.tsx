/**
 * Live figures from the cabinet engine. When the design cannot be planned, the field message shows and
 * the last good figures stay, greyed.
 */
import type { FiguresState } from '../model/figures';
import type { UnitSystem } from '../model/types';
import { formatLength } from '../model/units';

export interface FiguresPanelProps {
  state: FiguresState;
  units: UnitSystem;
  readOnly: boolean;
  /** A field path in words ("Shelf brace 1, position"). */
  describeField(field: string): string;
  /** An engine message with item paths named as the studio names the items. */
  plainMessage(text: string): string;
  onApplyPortLength(lengthMm: number): void;
  /** Selects the item a field path points at. */
  onShowField(field: string | undefined): void;
}

const n1 = (v: number) => v.toLocaleString('en-GB', { minimumFractionDigits: 1, maximumFractionDigits: 1 });
const n2 = (v: number) => v.toLocaleString('en-GB', { minimumFractionDigits: 2, maximumFractionDigits: 2 });

function Row({
  label,
  value,
  unit,
  note,
  testId,
  tone,
  raw,
}: {
  label: string;
  value: string;
  unit?: string;
  note?: string;
  testId?: string;
  tone?: 'warn';
  /** The unrounded number, for tests and tooltips. */
  raw?: number;
}) {
  return (
    <div className="flex items-baseline justify-between gap-3 py-[3px] text-[13px]">
      <dt className="text-zinc-600">
        {label}
        {note && <span className="ml-1 text-[11px] text-zinc-400">{note}</span>}
      </dt>
      <dd className={`font-mono tabular-nums ${tone === 'warn' ? 'text-orange-800' : 'text-zinc-900'}`}>
        <span data-testid={testId} data-value={raw} title={raw !== undefined ? String(raw) : undefined}>
          {value}
        </span>
        {unit && <span className="ml-1 text-[11px] text-zinc-500">{unit}</span>}
      </dd>
    </div>
  );
}

function Group({ title, children }: { title: string; children: React.ReactNode }) {
  return (
    <div className="border-t border-zinc-200 pt-2 first:border-t-0 first:pt-0">
      <h3 className="mb-1 text-[11px] font-bold uppercase tracking-wider text-zinc-500">{title}</h3>
      <dl>{children}</dl>
    </div>
  );
}

export function FiguresPanel({ state, units, readOnly, describeField, plainMessage, onApplyPortLength, onShowField }: FiguresPanelProps) {
  const f = state.figures;
  return (
    <div className="space-y-3" data-testid="studio-figures" aria-live="polite">
      {state.error && (
        <div role="alert" className="rounded border border-red-200 bg-red-50 px-2.5 py-2 text-[12.5px] leading-snug text-red-800">
          <p className="font-bold">This design cannot be planned yet</p>
          <ul className="mt-1 space-y-1">
            {Object.entries(state.error.fields).length > 0
              ? Object.entries(state.error.fields).map(([field, msg]) => (
                  <li key={field}>
                    <button type="button" className="text-left hover:underline" onClick={() => onShowField(field)} title={field}>
                      <span className="font-bold">{describeField(field)}:</span> {plainMessage(msg)}
                    </button>
                  </li>
                ))
              : [<li key="m">{plainMessage(state.error.message)}</li>]}
          </ul>
          {f && <p className="mt-1.5 text-[11.5px] text-red-700/80">The figures below are from the last design that could be planned.</p>}
        </div>
      )}
      {!f && !state.error && <p className="text-[13px] text-zinc-500">Working out the figures…</p>}
      {f && (
        <div className={`space-y-3 transition-opacity ${state.stale ? 'opacity-45 grayscale' : ''}`} data-stale={state.stale || undefined}>
          <Group title="Volume">
            <Row label="Gross internal" value={n2(f.grossLitres)} raw={f.grossLitres} unit="L" testId="fig-gross" />
            <Row label="Net" value={n2(f.netLitres)} raw={f.netLitres} unit="L" testId="fig-net" />
            {f.apparentLitresEstimate !== null && (
              <Row label="Apparent with lining" note="estimate" value={`≈ ${n1(f.apparentLitresEstimate)}`} unit="L" testId="fig-apparent" />
            )}
          </Group>
          <Group title="Port">
            {f.port ? (
              <>
                <Row label="Tuning" value={n1(f.port.tuningHz)} raw={f.port.tuningHz} unit="Hz" testId="fig-tuning" />
                {f.port.targetHz !== null && <Row label="Target" value={n1(f.port.targetHz)} unit="Hz" />}
                {f.port.lengthForTargetMm !== null && (
                  <div className="flex items-baseline justify-between gap-3 py-[3px] text-[13px]">
                    <span className="text-zinc-600">Length for target</span>
                    <span className="flex items-baseline gap-2">
                      <span className="font-mono tabular-nums text-zinc-900" data-testid="fig-length-for-target">
                        {f.port.lengthForTargetMm > 0 ? formatLength(f.port.lengthForTargetMm, units) : 'too short a box'}
                      </span>
                      {!readOnly && f.port.lengthForTargetMm > 0 && f.port.currentLengthMm !== null &&
                        Math.abs(f.port.lengthForTargetMm - f.port.currentLengthMm) >= 0.05 && (
                          <button
                            type="button"
                            className="rounded border border-accent-300 bg-accent-50 px-1.5 py-px text-[11.5px] font-bold text-accent-800 hover:bg-accent-100"
                            onClick={() => onApplyPortLength(f.port!.lengthForTargetMm!)}
                            disabled={state.stale}
                            title="Set every port to this length"
                          >
                            Apply
                          </button>
                        )}
                    </span>
                  </div>
                )}
                {f.port.peakAirSpeedMs !== null ? (
                  <Row
                    label="Peak air speed"
                    value={n1(f.port.peakAirSpeedMs)}
                    unit="m/s"
                    tone={f.port.airSpeedLimitMs !== null && f.port.peakAirSpeedMs > f.port.airSpeedLimitMs ? 'warn' : undefined}
                    testId="fig-air-speed"
                  />
                ) : (
                  <p className="py-[3px] text-[12px] text-zinc-400">Air speed: give a driver's cone area and excursion.</p>
                )}
              </>
            ) : (
              <p className="py-[3px] text-[12.5px] text-zinc-500">Closed box: no port.</p>
            )}
          </Group>
          <Group title="Lining">
            {f.lining ? (
              <>
                <Row label="Area" value={n2(f.lining.areaM2)} raw={f.lining.areaM2} unit="m²" testId="fig-lining-area" />
                <Row label="Mass" value={n2(f.lining.massKg)} unit="kg" />
                <Row label="Pieces" value={String(f.lining.pieceCount)} />
              </>
            ) : (
              <p className="py-[3px] text-[12.5px] text-zinc-500">No lining.</p>
            )}
          </Group>
          <Group title="Panels">
            <Row label="Panels to cut" value={String(f.panelCount)} testId="fig-panels" />
          </Group>
          <div className="border-t border-zinc-200 pt-2" id="studio-warnings">
            <h3 className="mb-1 text-[11px] font-bold uppercase tracking-wider text-zinc-500">
              Warnings <span className="font-normal normal-case tracking-normal text-zinc-400">({f.warnings.length})</span>
            </h3>
            {f.warnings.length === 0 ? (
              <p className="text-[12.5px] text-zinc-500">None.</p>
            ) : (
              <ul className="space-y-1" data-testid="fig-warnings">
                {f.warnings.map((w, i) => (
                  <li key={`${w.code}-${i}`}>
                    <button
                      type="button"
                      className="w-full rounded px-1.5 py-1 text-left text-[12.5px] leading-snug text-orange-900 hover:bg-orange-50"
                      onClick={() => onShowField(w.field)}
                    >
                      <span aria-hidden className="mr-1.5 inline-block h-2 w-2 rounded-full bg-orange-600 align-middle" />
                      {plainMessage(w.message)}
                    </button>
                  </li>
                ))}
              </ul>
            )}
          </div>
        </div>
      )}
    </div>
  );
}

/**
 * The key figures in one line under the drawing, always in view while dragging; the side panel has them all.
 * While the design cannot be planned it says why instead.
 */
export function FiguresStrip({
  state,
  describeField,
  plainMessage,
  onShowField,
  onShowWarnings,
}: {
  state: FiguresState;
  describeField(field: string): string;
  plainMessage(text: string): string;
  onShowField(field: string | undefined): void;
  onShowWarnings(): void;
}) {
  const f = state.figures;
  const Item = ({ label, value, unit, testId, raw }: { label: string; value: string; unit?: string; testId?: string; raw?: number }) => (
    <span className="whitespace-nowrap">
      <span className="text-zinc-500">{label}</span>{' '}
      <span className="font-mono text-zinc-900 tabular-nums" data-testid={testId} data-value={raw}>
        {value}
      </span>
      {unit && <span className="ml-0.5 text-[11px] text-zinc-500">{unit}</span>}
    </span>
  );
  const firstError = state.error ? Object.entries(state.error.fields)[0] : undefined;
  return (
    <div
      className="flex min-h-9 shrink-0 flex-wrap items-center gap-x-5 gap-y-0.5 border-t border-zinc-200 bg-white px-3 py-1.5 text-[12.5px]"
      data-testid="figures-strip"
      aria-label="Key figures"
    >
      {state.error ? (
        <button type="button" className="min-w-0 truncate text-left text-red-800 hover:underline" onClick={() => onShowField(firstError?.[0])}>
          <span className="mr-1.5 inline-block size-2 rounded-full bg-red-600 align-middle" aria-hidden />
          <strong>Cannot be planned:</strong> {firstError ? `${describeField(firstError[0])}: ${plainMessage(firstError[1])}` : plainMessage(state.error.message)}
        </button>
      ) : f ? (
        <>
          <Item label="Net" value={n2(f.netLitres)} unit="L" testId="strip-net" raw={f.netLitres} />
          <Item label="Gross" value={n2(f.grossLitres)} unit="L" />
          {f.port ? (
            <Item
              label="Tuning"
              value={n1(f.port.tuningHz)}
              unit={f.port.targetHz !== null ? `Hz (target ${n1(f.port.targetHz)})` : 'Hz'}
              testId="strip-tuning"
              raw={f.port.tuningHz}
            />
          ) : (
            <span className="text-zinc-500">Closed box</span>
          )}
          {f.port?.peakAirSpeedMs != null && <Item label="Port air" value={n1(f.port.peakAirSpeedMs)} unit="m/s" />}
          {f.lining && <Item label="Lining" value={n2(f.lining.areaM2)} unit="m²" />}
          <Item label="Panels" value={String(f.panelCount)} />
          <span className="ml-auto">
            {f.warnings.length === 0 ? (
              <span className="text-zinc-500">No warnings</span>
            ) : (
              <button type="button" className="rounded px-1.5 py-0.5 font-bold text-orange-900 hover:bg-orange-50" onClick={onShowWarnings}>
                <span className="mr-1.5 inline-block size-2 rounded-full bg-orange-600 align-middle" aria-hidden />
                {f.warnings.length === 1 ? '1 warning' : `${f.warnings.length} warnings`}
              </button>
            )}
          </span>
        </>
      ) : (
        <span className="text-zinc-500">Working out the figures…</span>
      )}
    </div>
  );
}
