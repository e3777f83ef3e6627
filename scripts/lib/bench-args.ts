// Command-line numbers and latency figures shared by the benchmark scripts.

/** `--name N` from the command line: a whole number from `min` to `max`, or `fallback` when the flag is absent. */
export const arg = (name: string, fallback: number, max: number, min = 1) => {
  const at = process.argv.indexOf(`--${name}`);
  const value = at === -1 ? fallback : Number(process.argv[at + 1]);
  if (!Number.isInteger(value) || value < min || value > max) throw new Error(`--${name} must be a whole number from ${min} to ${max}.`);
  return value;
};

/** The `p`th percentile (nearest rank) of ascending `sorted`. */
export const percentile = (sorted: number[], p: number) => sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)];
