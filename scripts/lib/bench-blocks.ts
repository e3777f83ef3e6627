// Runs kinds of work in alternating blocks (A B A B …) with the same number of concurrent clients, so
// both kinds see the same machine load and a noisy neighbour slows both alike; the figures are ratios.

export type BenchKind = { name: string; run: (i: number) => Promise<void> };
export type KindResult = { name: string; latencies: number[]; wallMs: number; failures: number };

export type BlockOptions = {
  kinds: readonly BenchKind[];
  clients: number;
  /** Operations per block of one kind. */
  perBlock: number;
  /** Most rounds (one block of each kind per round). */
  blocks: number;
  /** Stop after the round in which this many seconds have passed. */
  maxSeconds: number;
};

async function runBlock(kind: BenchKind, clients: number, count: number, into: KindResult, offset: number) {
  let next = 0;
  const started = performance.now();
  await Promise.all(
    Array.from({ length: Math.min(clients, count) }, async () => {
      while (next < count) {
        const i = offset + next++;
        const t = performance.now();
        try {
          await kind.run(i);
          into.latencies.push(performance.now() - t);
        } catch {
          into.failures++;
        }
      }
    }),
  );
  into.wallMs += performance.now() - started;
}

/** Latencies come back sorted ascending; `wallMs` is the time spent in this kind's blocks only. */
export async function runBlocks({ kinds, clients, perBlock, blocks, maxSeconds }: BlockOptions): Promise<KindResult[]> {
  const results = kinds.map((k) => ({ name: k.name, latencies: [] as number[], wallMs: 0, failures: 0 }));
  const started = performance.now();
  for (let round = 0; round < blocks; round++) {
    // Swap the order every other round so neither kind always follows the other.
    const order = round % 2 === 0 ? kinds.map((_, i) => i) : kinds.map((_, i) => kinds.length - 1 - i);
    for (const i of order) await runBlock(kinds[i], clients, perBlock, results[i], round * perBlock);
    if (performance.now() - started > maxSeconds * 1000) break;
  }
  for (const r of results) r.latencies.sort((a, b) => a - b);
  return results;
}
