/** '' → undefined; "1,5" reads as 1.5 and "1,000" as 1000; anything else that isn't a number → NaN. */
export function readNumber(text: string): number | undefined {
  const t = text.trim().replace(/\s+/g, '');
  if (t === '') return undefined;
  // "1,000" and "12,500" are thousands; "2,5" and "0,125" are a decimal comma.
  const thousands = /^[1-9]\d{0,2}(,\d{3})+$/.test(t);
  const normalised = thousands ? t.replace(/,/g, '') : /^\d+,\d+$/.test(t) ? t.replace(',', '.') : t;
  return /^[+-]?(\d+\.?\d*|\.\d+)$/.test(normalised) ? Number(normalised) : Number.NaN;
}
