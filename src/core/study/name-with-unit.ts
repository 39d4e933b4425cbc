/**
 * A name with its unit, the one way Trialbook writes a labeled quantity in headings, chart axes
 * and CSV headers: "Film thickness (µm)", or the bare name when there is no unit. A categorical
 * factor has no unit (its levels are names). Common practice for column headers.
 */
import type { Factor } from '../factor/factor.ts';

/**
 * "<name> (<unit>)", or the name alone when the unit is missing or blank; the unit is trimmed.
 * Example: nameWithUnit('Film thickness', 'µm') -> 'Film thickness (µm)'; nameWithUnit('Gloss') -> 'Gloss';
 * nameWithUnit('Time (min)', 'min') -> 'Time (min)'.
 */
export function nameWithUnit(name: string, unit?: string | null): string {
  const u = unit?.trim() ?? '';
  // A name read from a CSV header often carries its unit already ("Time (min)"): not twice.
  return u === '' || name.endsWith(`(${u})`) ? name : `${name} (${u})`;
}

/**
 * A factor's name with its unit (numeric factors only).
 * Example: factorLabel(Oven temperature in °C) -> 'Oven temperature (°C)'; factorLabel(Powder) -> 'Powder'.
 */
export function factorLabel(f: Factor): string {
  return nameWithUnit(f.name, f.kind === 'numeric' ? f.unit : undefined);
}
