// Decimal rounding for display. The exact path works on decimal strings (number → string → number), which is
// what makes it exact and also what makes it slow; the fast path does the same sums in binary and is taken only
// when binary error cannot change the result, that is when the scaled value is clearly away from a .5 tie.

// Scaled values below this keep their fraction exact in a double (and so does n / 10^d for n below it).
const FAST_LIMIT = 2 ** 50;
// The exact path first rounds to 12 significant digits (relative change ≤ 5e-12); twice that, to be safe.
const CLEAN_MARGIN = 1e-11;

// Round half away from zero on the decimal digits, after shedding binary noise (4.762499999… is 4.7625).
function exactRoundTo(value: number, decimals: number): number {
  const clean = Number(value.toPrecision(12));
  const shifted =
    Math.abs(clean) >= 1e-6 && Math.abs(clean) < 1e15 ? Number(`${Math.abs(clean)}e${decimals}`) : Math.abs(clean) * 10 ** decimals;
  return (Math.sign(clean) * Math.round(shifted)) / 10 ** decimals;
}

function exactFixed(value: number, decimals: number): string {
  const s = exactRoundTo(value, decimals).toFixed(decimals);
  return s.charCodeAt(0) === 45 && (s === "-0" || /^-0\.0*$/.test(s)) ? s.slice(1) : s;
}

/** |value| · 10^decimals rounded half up, when binary arithmetic gets the same whole number as the exact path; else -1. */
function fastScaledRound(value: number, decimals: number, margin: number): number {
  const scaled = Math.abs(value) * 10 ** decimals;
  if (!(scaled < FAST_LIMIT)) return -1;
  const whole = Math.floor(scaled);
  const fraction = scaled - whole;
  if (Math.abs(fraction - 0.5) <= scaled * margin) return -1;
  return fraction > 0.5 ? whole + 1 : whole;
}

/** The whole number `n` written with `decimals` decimals (n / 10^decimals), as toFixed would print it. */
function withDecimals(n: number, decimals: number, negative: boolean): string {
  let digits = String(n);
  if (decimals > 0) {
    if (digits.length <= decimals) digits = "0".repeat(decimals + 1 - digits.length) + digits;
    digits = `${digits.slice(0, -decimals)}.${digits.slice(-decimals)}`;
  }
  return negative && n > 0 ? `-${digits}` : digits;
}

/** Fixed decimals, rounded half away from zero on the decimal value; never "-0". */
export function fixed(value: number, decimals: number): string {
  const n = decimals <= 20 ? fastScaledRound(value, decimals, CLEAN_MARGIN) : -1;
  return n < 0 ? exactFixed(value, decimals) : withDecimals(n, decimals, value < 0);
}

/** Number(value.toPrecision(3)): the value rounded to three significant digits. */
export function toPrecision3(value: number): number {
  const magnitude = Math.abs(value);
  if (magnitude >= 1e-300 && magnitude < 1e300) {
    const decimals = 2 - Math.floor(Math.log10(magnitude));
    if (decimals >= -20 && decimals <= 20) {
      // toPrecision rounds the double's exact value, so only the one binary rounding of the scaling counts.
      const n = decimals >= 0 ? fastScaledRound(value, decimals, 1e-12) : fastScaledRound(value / 10 ** -decimals, 0, 1e-12);
      if (n >= 100 && n < 1000) {
        const rounded = decimals >= 0 ? n / 10 ** decimals : n * 10 ** -decimals;
        return value < 0 ? -rounded : rounded;
      }
    }
  }
  return Number(value.toPrecision(3));
}
