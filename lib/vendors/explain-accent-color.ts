/** Why a typed accent colour is not one, in a sentence; null when it is a colour (#2f5d8a). */
export function explainAccentColor(raw: string): string | null {
  const value = raw.trim();
  if (/^#[0-9a-f]{6}$/i.test(value)) return null;
  if (!value) return "Give a colour: # and six hex digits, like #2f5d8a.";
  if (!value.startsWith("#")) return `Start the colour with #, like #${value.replace(/^#*/, "").slice(0, 6) || "2f5d8a"}.`;
  const digits = value.slice(1);
  const bad = [...digits].find((c) => !/[0-9a-f]/i.test(c));
  if (bad) return `“${bad}” is not a hex digit; a colour uses only 0–9 and a–f, like #2f5d8a.`;
  if (digits.length === 3) return `Write all six digits: #${[...digits].map((c) => c + c).join("")} instead of #${digits}.`;
  return `A colour has six hex digits after #; this has ${digits.length}. For example #2f5d8a.`;
}
