/**
 * A length field that accepts mm or inches whatever the unit shown (`314.5 mm`, `12 3/8 in`, `12.375"`);
 * a bare number is read in the current unit. Commits on Enter or leaving the field; Escape reverts.
 */
import { useEffect, useId, useState } from 'react';
import type { UnitSystem } from '../model/types';
import { formatLength, parseLength } from '../model/units';

export interface LengthInputProps {
  label: string;
  valueMm: number | undefined;
  units: UnitSystem;
  readOnly?: boolean;
  /** Smallest accepted value (exclusive 0 by default: lengths are positive). */
  min?: number;
  allowEmpty?: boolean;
  onCommit(valueMm: number | undefined): void;
  testId?: string;
}

export function LengthInput({ label, valueMm, units, readOnly, min = 0, allowEmpty, onCommit, testId }: LengthInputProps) {
  const shown = valueMm === undefined ? '' : formatLength(valueMm, units);
  const [text, setText] = useState(shown);
  const [error, setError] = useState<string | null>(null);
  const id = useId();
  useEffect(() => {
    setText(shown);
    setError(null);
  }, [shown]);

  const commit = () => {
    if (text.trim() === '' && allowEmpty) {
      setError(null);
      if (valueMm !== undefined) onCommit(undefined);
      return;
    }
    if (text === shown) return;
    const r = parseLength(text, units);
    if (!r.ok) return setError(r.message);
    if (!(r.mm > min)) return setError(`${label.toLowerCase()} must be greater than ${formatLength(min, units)}`);
    setError(null);
    onCommit(Math.round(r.mm * 10000) / 10000);
  };

  return (
    <label htmlFor={id} className="grid grid-cols-[1fr_7.5rem] items-center gap-2 text-[13px]">
      <span className="text-zinc-600">{label}</span>
      <span className="flex flex-col">
        <input
          id={id}
          data-testid={testId}
          className={`h-7 rounded border bg-white px-2 text-right font-mono text-[12.5px] tabular-nums text-zinc-800 read-only:bg-zinc-50 read-only:text-zinc-500 ${
            error ? 'border-red-500' : 'border-zinc-300 focus:border-accent-500'
          }`}
          value={text}
          readOnly={readOnly}
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? `${id}-err` : undefined}
          onChange={(e) => setText(e.target.value)}
          onFocus={(e) => e.target.select()}
          onBlur={commit}
          onKeyDown={(e) => {
            if (e.key === 'Enter') commit();
            if (e.key === 'Escape') {
              setText(shown);
              setError(null);
            }
          }}
        />
        {error && (
          <span id={`${id}-err`} className="mt-0.5 text-[11px] leading-tight text-red-700">
            {error}
          </span>
        )}
      </span>
    </label>
  );
}

export interface NumberFieldProps {
  label: string;
  value: number | undefined;
  unit: string;
  readOnly?: boolean;
  allowEmpty?: boolean;
  onCommit(value: number | undefined): void;
}

/** A plain number (litres, Hz, cm²) with its unit after it. */
export function NumberField({ label, value, unit, readOnly, allowEmpty, onCommit }: NumberFieldProps) {
  const shown = value === undefined ? '' : String(value);
  const [text, setText] = useState(shown);
  const [error, setError] = useState<string | null>(null);
  const id = useId();
  useEffect(() => {
    setText(shown);
    setError(null);
  }, [shown]);
  const commit = () => {
    if (text === shown) return;
    if (text.trim() === '') {
      if (allowEmpty) onCommit(undefined);
      else setError(`${label.toLowerCase()} is required`);
      return;
    }
    const n = Number(text.trim().replace(',', '.'));
    if (!Number.isFinite(n) || n < 0) return setError(`${label.toLowerCase()} must be a number, 0 or more`);
    setError(null);
    onCommit(n);
  };
  return (
    <label htmlFor={id} className="grid grid-cols-[1fr_7.5rem] items-center gap-2 text-[13px]">
      <span className="text-zinc-600">{label}</span>
      <span className="flex flex-col">
        <span className="relative">
          <input
            id={id}
            className={`h-7 w-full rounded border bg-white pl-2 pr-9 text-right font-mono text-[12.5px] tabular-nums read-only:bg-zinc-50 read-only:text-zinc-500 ${
              error ? 'border-red-500' : 'border-zinc-300 focus:border-accent-500'
            }`}
            value={text}
            readOnly={readOnly}
            inputMode="decimal"
            onChange={(e) => setText(e.target.value)}
            onFocus={(e) => e.target.select()}
            onBlur={commit}
            onKeyDown={(e) => e.key === 'Enter' && commit()}
          />
          <span className="pointer-events-none absolute right-2 top-1/2 -translate-y-1/2 text-[11px] text-zinc-400">{unit}</span>
        </span>
        {error && <span className="mt-0.5 text-[11px] leading-tight text-red-700">{error}</span>}
      </span>
    </label>
  );
}
