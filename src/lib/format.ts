/** Display formatting. Lengths are millimetres inside; shown with their unit. */
import { formatInches, type LengthUnit } from '../../shared/units/index';

const numberFormat = new Intl.NumberFormat('en-GB', { maximumFractionDigits: 1, useGrouping: false });

/** `1234.56` → `1234.6`: no thousands separator (as on workshop drawings), one decimal by default. */
export function formatNumber(value: number, maximumFractionDigits = 1): string {
  if (maximumFractionDigits === 1) return numberFormat.format(value);
  return new Intl.NumberFormat('en-GB', { maximumFractionDigits, useGrouping: false }).format(value);
}

/** Outer size as W × H × D, e.g. `220 × 360 × 260 mm`. */
export function formatSizeMm(widthMm: number, heightMm: number, depthMm: number): string {
  return `${formatNumber(widthMm)} × ${formatNumber(heightMm)} × ${formatNumber(depthMm)} mm`;
}

/** Outer size as W × H × D in the user's unit: `220 × 360 × 260 mm`, or `8 11/16 × 14 3/16 × 10 1/4 in`. */
export function formatSize(widthMm: number, heightMm: number, depthMm: number, unit: LengthUnit): string {
  if (unit === 'mm') return formatSizeMm(widthMm, heightMm, depthMm);
  return `${[widthMm, heightMm, depthMm].map((v) => formatInches(v).replace(/"$/, '')).join(' × ')} in`;
}

const UNITS: Array<[Intl.RelativeTimeFormatUnit, number]> = [
  ['year', 365 * 24 * 3600],
  ['month', 30 * 24 * 3600],
  ['week', 7 * 24 * 3600],
  ['day', 24 * 3600],
  ['hour', 3600],
  ['minute', 60],
];

/** "3 minutes ago", "yesterday", "just now"; `now` is injected so it can be tested. */
export function formatRelativeTime(iso: string, now: Date = new Date()): string {
  const then = new Date(iso);
  if (Number.isNaN(then.getTime())) return '—';
  const seconds = Math.round((then.getTime() - now.getTime()) / 1000);
  if (Math.abs(seconds) < 45) return 'just now';
  const rtf = new Intl.RelativeTimeFormat('en-GB', { numeric: 'auto' });
  for (const [unit, size] of UNITS) {
    if (Math.abs(seconds) >= size) return rtf.format(Math.round(seconds / size), unit);
  }
  return rtf.format(Math.round(seconds / 60), 'minute');
}

/** Full date and time for a tooltip, e.g. `2 Dec 2026, 14:05`. */
export function formatDateTime(iso: string): string {
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return '';
  return new Intl.DateTimeFormat('en-GB', { dateStyle: 'medium', timeStyle: 'short' }).format(date);
}
