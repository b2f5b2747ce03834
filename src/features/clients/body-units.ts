/** Body stats in US measures, converted to what the estimate takes (cm, kg), by the NIST factors of shared/units.ts. */
import { CM_PER_INCH, INCHES_PER_FOOT, KG_PER_POUND } from '../../../shared/units';

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
