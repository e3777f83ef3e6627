/** A piece of SQL with its `?` bindings, so pieces combine without counting placeholders by hand. */
export type Fragment = { sql: string; bindings: unknown[] };

export const frag = (sql: string, ...bindings: unknown[]): Fragment => ({ sql, bindings });

export function joinFrags(parts: readonly Fragment[], separator: string): Fragment {
  return { sql: parts.map((p) => p.sql).join(separator), bindings: parts.flatMap((p) => p.bindings) };
}

/** Fills a template: each `$n` placeholder (n ≥ 1) takes the n-th fragment. */
export function compose(template: string, ...parts: Fragment[]): Fragment {
  const bindings: unknown[] = [];
  const sql = template.replace(/\$(\d+)/g, (_, n: string) => {
    const part = parts[Number(n) - 1];
    bindings.push(...part.bindings);
    return part.sql;
  });
  return { sql, bindings };
}
