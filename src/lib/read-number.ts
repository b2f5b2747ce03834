/**
 * The one reader of numbers typed into a form. Every box reads the same way:
 * - '' (or only spaces) → undefined, so a form can tell "left empty" from "not a number";
 * - thousands grouped by commas or by spaces ("1,000", "12,500.5", "1 000", "1 000,5"; also the
 *   no-break and narrow no-break spaces a copied figure brings) → 1000, 12500.5, 1000, 1000.5;
 * - a decimal comma ("2,5", "0,125") → 2.5, 0.125; a leading dot (".5") and a sign ("-3") are kept;
 * - anything else ("12g", "1 2", "1,2,3", "1/2") → NaN.
 */
export function readNumber(text: string): number | undefined {
  const t = text.trim();
  if (t === '') return undefined;
  const sign = t[0] === '-' || t[0] === '+' ? t[0] : '';
  const body = t.slice(sign.length);
  let plain: string;
  if (/^[1-9]\d{0,2}(?:,\d{3})+(?:\.\d+)?$/.test(body)) plain = body.replace(/,/g, '');
  else if (/^[1-9]\d{0,2}(?:[ \u00a0\u202f]\d{3})+(?:[.,]\d+)?$/.test(body)) plain = body.replace(/[ \u00a0\u202f]/g, '').replace(',', '.');
  else if (/^\d+,\d+$/.test(body)) plain = body.replace(',', '.');
  else plain = body;
  return /^(?:\d+\.?\d*|\.\d+)$/.test(plain) ? Number(`${sign}${plain}`) : Number.NaN;
}

/** readNumber where an empty box is not a number either. */
export function readRequiredNumber(text: string): number {
  return readNumber(text) ?? Number.NaN;
}

/** A figure for a form field: whole numbers stay whole, others keep up to `digits` decimals. */
export function numberText(value: number | undefined | null, digits = 1): string {
  if (value === undefined || value === null || !Number.isFinite(value)) return '';
  return String(Number(value.toFixed(digits)));
}
