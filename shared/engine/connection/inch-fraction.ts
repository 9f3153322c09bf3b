/** Shop notation for inch dimensions: 1.3125 -> "1-5/16", rounded to the nearest 1/16 in. */
export function inchFraction(inches: number): string {
  if (!Number.isFinite(inches)) return '—';
  const sixteenths = Math.round(Math.abs(inches) * 16);
  const whole = Math.floor(sixteenths / 16);
  let num = sixteenths % 16;
  let den = 16;
  while (num > 0 && num % 2 === 0) {
    num /= 2;
    den /= 2;
  }
  const sign = inches < 0 && sixteenths > 0 ? '-' : '';
  if (num === 0) return `${sign}${whole}`;
  return whole === 0 ? `${sign}${num}/${den}` : `${sign}${whole}-${num}/${den}`;
}
