/**
 * Inspector fields that commit on Enter or on leaving the field (Escape reverts): lengths accept mm or
 * inches whatever the unit shown (`314.5 mm`, `12 3/8 in`, `12.375"`; a bare number is in the shown unit)
 * and show the exact value (lib/length-text); plain numbers (litres, Hz, cm²) show their unit after them.
 */
import { useEffect, useId, useState } from 'react';
import type { UnitSystem } from '../model/types';
import { formatLengthInput, parseLengthInput } from '../../../lib/length-text';

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
            // Nothing typed since the value was shown: Ctrl+Z here undoes in the studio, not in the box.
            data-pristine={text === shown || undefined}
            className={`h-7 w-full rounded border bg-white pr-2 pl-2 text-right font-mono text-[12.5px] tabular-nums text-zinc-800 read-only:bg-zinc-50 read-only:text-zinc-500 ${
              error ? 'border-red-500' : 'border-zinc-300 focus:border-accent-500'
            }`}
            // Room for the unit after the number, however long it is (L, Hz, kg/m³).
            style={suffix ? { paddingRight: `${16 + suffix.length * 6.5}px` } : undefined}
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
  /** 0 is allowed (a position, a tube wall, a crush allowance); otherwise lengths must be greater than 0. */
  allowZero?: boolean;
  allowEmpty?: boolean;
  onCommit(valueMm: number | undefined): void;
  testId?: string;
}

export function LengthInput({ label, valueMm, units, allowZero, allowEmpty, ...rest }: LengthInputProps) {
  const parse = (text: string): Parsed => {
    const r = parseLengthInput(text, units);
    if (!r.ok) return r;
    if (r.mm === undefined) return allowEmpty ? { ok: true, value: undefined } : { ok: false, message: `${label.toLowerCase()} is required` };
    if (allowZero ? r.mm < 0 : !(r.mm > 0)) return { ok: false, message: `${label.toLowerCase()} must be ${allowZero ? '0 or more' : 'greater than 0'}` };
    return { ok: true, value: r.mm };
  };
  const shown = valueMm === undefined ? '' : formatLengthInput(valueMm, units, { unit: true });
  return <CommitInput label={label} shown={shown} parse={parse} {...rest} />;
}

export interface NumberFieldProps {
  label: string;
  value: number | undefined;
  /** Shown after the number; none for a count. */
  unit?: string;
  readOnly?: boolean;
  allowEmpty?: boolean;
  /** Whole numbers only, from `min` to `max` (a count of screw holes). */
  integer?: { min: number; max: number };
  /** The value must be greater than 0 (a density, a cone area), not just 0 or more. */
  positive?: boolean;
  onCommit(value: number | undefined): void;
  testId?: string;
}

export function NumberField({ label, value, unit, allowEmpty, integer, positive, ...rest }: NumberFieldProps) {
  const parse = (text: string): Parsed => {
    const name = label.toLowerCase();
    if (text.trim() === '') return allowEmpty ? { ok: true, value: undefined } : { ok: false, message: `${name} is required` };
    const n = Number(text.trim().replace(',', '.'));
    if (integer) {
      if (!Number.isInteger(n) || n < integer.min || n > integer.max) return { ok: false, message: `${name} must be a whole number from ${integer.min} to ${integer.max}` };
      return { ok: true, value: n };
    }
    if (!Number.isFinite(n) || n < 0 || (positive && n === 0)) return { ok: false, message: `${name} must be a number ${positive ? 'greater than 0' : '0 or more'}` };
    return { ok: true, value: n };
  };
  return <CommitInput label={label} shown={value === undefined ? '' : String(value)} parse={parse} suffix={unit} {...rest} />;
}
