import { data } from 'react-router-dom';

/** A route id from the URL as a positive integer, or a 404 for anything else. */
export function parseId(value: string | undefined): number {
  const n = Number(value);
  if (!value || !Number.isInteger(n) || n <= 0) throw data('Not found', { status: 404 });
  return n;
}
