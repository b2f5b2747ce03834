/**
 * Body stats in US measures, converted to what the estimate takes (cm, kg).
 * NIST Handbook 44 Appendix C: 1 in = 2.54 cm exactly; 1 lb = 0.45359237 kg exactly.
 */
export const CM_PER_INCH = 2.54;
export const INCHES_PER_FOOT = 12;
export const KG_PER_POUND = 0.45359237;

export type BodyUnits = 'metric' | 'us';

export function cmFromFeetInches(feet: number, inches: number): number {
  return (feet * INCHES_PER_FOOT + inches) * CM_PER_INCH;
}

export function kgFromPounds(pounds: number): number {
  return pounds * KG_PER_POUND;
}

/** Whole feet and the inches left over, rounded to a tenth of an inch. */
export function feetInchesFromCm(cm: number): { feet: number; inches: number } {
  const totalTenths = Math.round((cm / CM_PER_INCH) * 10);
  const feet = Math.floor(totalTenths / (INCHES_PER_FOOT * 10));
  return { feet, inches: (totalTenths - feet * INCHES_PER_FOOT * 10) / 10 };
}

export function poundsFromKg(kg: number): number {
  return kg / KG_PER_POUND;
}
