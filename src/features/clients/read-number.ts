/** '' → undefined; "1,5" reads as 1.5 and "1,000" as 1000; anything else that isn't a plain number → NaN. */
export function readNumber(text: string): number | undefined {
  const t = text.trim().replace(/\s+/g, '');
  if (t === '') return undefined;
  // "1,000" and "12,500" are thousands; "2,5" and "0,125" are a decimal comma.
  const thousands = /^[1-9]\d{0,2}(,\d{3})+$/.test(t);
  const normalised = thousands ? t.replace(/,/g, '') : /^\d+,\d+$/.test(t) ? t.replace(',', '.') : t;
  return /^[+-]?(\d+\.?\d*|\.\d+)$/.test(normalised) ? Number(normalised) : Number.NaN;
}

/** A figure for a form field: whole numbers stay whole, others keep up to `digits` decimals. */
export function numberText(value: number | undefined | null, digits = 1): string {
  if (value === undefined || value === null || !Number.isFinite(value)) return '';
  return String(Number(value.toFixed(digits)));
}
