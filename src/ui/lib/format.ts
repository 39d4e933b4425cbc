/**
 * Numbers as the screens show them: a point for decimals (the run form reads numbers that way),
 * a true minus sign, four significant digits, and a dash for "not available".
 */
import { formatSetting } from '../../core/predict/parse-settings.ts';

/** A number to four significant digits, or a dash for null. Example: num(76.0945) -> '76.09'. */
export function num(x: number | null | undefined, digits = 4): string {
  if (x === null || x === undefined || !Number.isFinite(x)) return '–';
  const s = String(Number(x.toPrecision(digits)));
  return s.startsWith('-') ? '−' + s.slice(1) : s;
}

/** A signed number: '+7.92' or '−6.17'. */
export function signed(x: number, digits = 3): string {
  const s = num(x, digits);
  return x > 0 ? '+' + s : s;
}

/** A value with its unit: '70.3 µm'. */
export function withUnit(x: number | null | undefined, unit: string | undefined, digits = 4): string {
  const s = num(x, digits);
  return unit && s !== '–' ? `${s} ${unit}` : s;
}

/** A real setting with its unit ('180 °C', 'gloss'). */
export function setting(value: number | string, unit?: string): string {
  const s = formatSetting(value, unit);
  // The screens write a negative number with the minus sign, as num() does.
  return typeof value === 'number' && s.startsWith('-') ? '−' + s.slice(1) : s;
}

/** A coded value with its sign: '+1.5', '−1', '0'. */
export function coded(x: number): string {
  const r = Math.round(x * 100) / 100;
  if (r === 0) return '0';
  return (r > 0 ? '+' : '−') + String(Math.abs(r));
}

/** A fraction as a percentage: 0.9993 -> '99.9%'. */
export function percent(x: number | null): string {
  if (x === null || !Number.isFinite(x)) return '–';
  return `${(Math.round(x * 1000) / 10).toFixed(1)}%`;
}

export { when } from './when.ts';

/** A term's name for reading: 'Oven temperature:Line speed' -> 'Oven temperature × Line speed'. */
export function termLabel(name: string): string {
  return name.split(':').join(' × ');
}
