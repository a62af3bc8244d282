/**
 * Inspector fields that commit on Enter or on leaving the field (Escape reverts): lengths accept mm or
 * inches whatever the unit shown (`314.5 mm`, `12 3/8 in`, `12.375"`; a bare number is in the shown unit),
 * plain numbers (litres, Hz, cm²) show their unit after them.
 */
import { useEffect, useId, useState } from 'react';
import type { UnitSystem } from '../model/types';
import { formatLength, parseLength } from '../model/units';

type Parsed = { ok: true; value: number | undefined } | { ok: false; message: string };

interface CommitInputProps {
  label: string;
  /** The value as shown; edits start from it and Escape returns to it. */
  shown: string;
  readOnly?: boolean;
  /** Turns the typed text into a value, or a message naming the problem. */
  parse(text: string): Parsed;
  onCommit(value: number | undefined): void;
  suffix?: string;
  testId?: string;
}

function CommitInput({ label, shown, readOnly, parse, onCommit, suffix, testId }: CommitInputProps) {
  const [text, setText] = useState(shown);
  const [error, setError] = useState<string | null>(null);
  const id = useId();
  useEffect(() => {
    setText(shown);
    setError(null);
  }, [shown]);
  const commit = () => {
    if (text === shown) return;
    const r = parse(text);
    if (!r.ok) return setError(r.message);
    setError(null);
    onCommit(r.value);
  };
  return (
    <label htmlFor={id} className="grid grid-cols-[1fr_7.5rem] items-center gap-2 text-[13px]">
      <span className="text-zinc-600">{label}</span>
      <span className="flex flex-col">
        <span className="relative">
          <input
            id={id}
            data-testid={testId}
            className={`h-7 w-full rounded border bg-white pl-2 text-right font-mono text-[12.5px] tabular-nums text-zinc-800 read-only:bg-zinc-50 read-only:text-zinc-500 ${
              suffix ? 'pr-9' : 'pr-2'
            } ${error ? 'border-red-500' : 'border-zinc-300 focus:border-accent-500'}`}
            value={text}
            readOnly={readOnly}
            inputMode={suffix ? 'decimal' : undefined}
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
          {suffix && <span className="pointer-events-none absolute right-2 top-1/2 -translate-y-1/2 text-[11px] text-zinc-400">{suffix}</span>}
        </span>
        {error && (
          <span id={`${id}-err`} className="mt-0.5 text-[11px] leading-tight text-red-700">
            {error}
          </span>
        )}
      </span>
    </label>
  );
}

export interface LengthInputProps {
  label: string;
  valueMm: number | undefined;
  units: UnitSystem;
  readOnly?: boolean;
  /** Values must be greater than this (0 by default: lengths are positive). */
  min?: number;
  allowEmpty?: boolean;
  onCommit(valueMm: number | undefined): void;
  testId?: string;
}

export function LengthInput({ label, valueMm, units, min = 0, allowEmpty, ...rest }: LengthInputProps) {
  const parse = (text: string): Parsed => {
    if (text.trim() === '' && allowEmpty) return { ok: true, value: undefined };
    const r = parseLength(text, units);
    if (!r.ok) return r;
    if (!(r.mm > min)) return { ok: false, message: `${label.toLowerCase()} must be greater than ${formatLength(min, units)}` };
    return { ok: true, value: Math.round(r.mm * 10000) / 10000 };
  };
  return <CommitInput label={label} shown={valueMm === undefined ? '' : formatLength(valueMm, units)} parse={parse} {...rest} />;
}

export interface NumberFieldProps {
  label: string;
  value: number | undefined;
  unit: string;
  readOnly?: boolean;
  allowEmpty?: boolean;
  onCommit(value: number | undefined): void;
}

export function NumberField({ label, value, unit, allowEmpty, ...rest }: NumberFieldProps) {
  const parse = (text: string): Parsed => {
    if (text.trim() === '') return allowEmpty ? { ok: true, value: undefined } : { ok: false, message: `${label.toLowerCase()} is required` };
    const n = Number(text.trim().replace(',', '.'));
    if (!Number.isFinite(n) || n < 0) return { ok: false, message: `${label.toLowerCase()} must be a number, 0 or more` };
    return { ok: true, value: n };
  };
  return <CommitInput label={label} shown={value === undefined ? '' : String(value)} parse={parse} suffix={unit} {...rest} />;
}
