// The lower Wilson bound (see wilson.ts) as SQL over the rollup's columns, so PostgreSQL can rank
// thousands of versions and return only the top rows. `z` is bound once as the lateral column zz.z.
// tests/integration/field/needs-attention.test.ts checks it against wilsonInterval().
export const WILSON_LOWER_SQL = `case when r.failed = 0 or r.outcomes = 0 then 0 else greatest(0,
  ((r.failed::float8 / r.outcomes) + zz.z * zz.z / (2 * r.outcomes)
   - zz.z * sqrt((r.failed::float8 / r.outcomes) * (1 - r.failed::float8 / r.outcomes) / r.outcomes + zz.z * zz.z / (4.0 * r.outcomes * r.outcomes)))
  / (1 + zz.z * zz.z / r.outcomes)) end`;
