import { randomBytes } from "node:crypto";

// No 0/o, 1/l/i: the code is typed from a tool-box label.
const ALPHABET = "23456789abcdefghjkmnpqrstuvwxyz";

/** A short random code for a cutter's deep link, e.g. `k7m2qx`. */
export function newShortCode(length = 7): string {
  const bytes = randomBytes(length);
  return Array.from(bytes, (b) => ALPHABET[b % ALPHABET.length]).join("");
}
