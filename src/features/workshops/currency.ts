import type { Currency } from '../../../shared/schemas/api.schema';

/** "EUR — Euro": the code with its English name from the browser's Intl (ECMA-402 DisplayNames), or the code alone. */
export function currencyLabel(code: Currency): string {
  try {
    const name = new Intl.DisplayNames(['en'], { type: 'currency' }).of(code);
    return name && name !== code ? `${code} — ${name}` : code;
  } catch {
    return code;
  }
}
