import { JsonBlock } from "./json-block";

type Example = { summary: string; value: unknown };
type Media = { schema?: unknown; examples?: Record<string, Example> };
type Parameter = { name: string; in: string; required: boolean; description?: string; schema?: { type?: unknown; enum?: unknown[] } };
export type OperationDoc = {
  operationId: string;
  summary: string;
  description?: string;
  parameters?: Parameter[];
  requestBody?: { content: Record<string, Media> };
  responses: Record<string, { description?: string; content?: Record<string, Media>; $ref?: string }>;
  "x-swarfbook-permission"?: string;
  "x-swarfbook-roles"?: readonly string[];
  "x-swarfbook-rate-limit": { limit: number; windowSeconds: number; bucket: string };
};

const typeOf = (p: Parameter) => (p.schema?.enum ? p.schema.enum.join(" | ") : String(p.schema?.type ?? "string"));

function Examples({ media }: { media?: Media }) {
  if (!media?.examples) return null;
  return Object.entries(media.examples).map(([name, ex]) => <JsonBlock key={name} label={`Example: ${ex.summary}`} value={ex.value} />);
}

/** One endpoint of the API reference, from its entry in the OpenAPI document. */
export function OperationCard({ method, path, op }: { method: string; path: string; op: OperationDoc }) {
  const rate = op["x-swarfbook-rate-limit"];
  const json = op.requestBody?.content["application/json"];
  return (
    <article id={op.operationId} className="mb-6 rounded-lg border border-stone-200 bg-white p-4" data-operation={`${method} ${path}`}>
      <h3 className="flex flex-wrap items-baseline gap-2 font-semibold">
        <span className="num rounded bg-stone-800 px-2 py-0.5 text-xs text-white">{method}</span>
        <code className="num break-all text-sm">{path}</code>
      </h3>
      <p className="mt-1">{op.summary}</p>
      {op.description ? <p className="mt-1 text-sm text-stone-700">{op.description}</p> : null}
      <p className="mt-2 text-sm text-stone-600">
        {op["x-swarfbook-permission"] ? (
          <>
            Scope <code>{op["x-swarfbook-permission"]}</code> ({op["x-swarfbook-roles"]?.join(", ")}).{" "}
          </>
        ) : null}
        Rate limit {rate.limit} per {rate.windowSeconds} s{rate.bucket === "own" ? ", its own bucket" : ", shared bucket"}.
      </p>
      {op.parameters?.length ? (
        <table className="mt-3 w-full text-left text-sm">
          <thead className="text-stone-600">
            <tr>
              <th className="pr-3">Parameter</th>
              <th className="pr-3">In</th>
              <th className="pr-3">Type</th>
              <th>Notes</th>
            </tr>
          </thead>
          <tbody>
            {op.parameters.map((p) => (
              <tr key={`${p.in}-${p.name}`} className="border-t border-stone-100 align-top">
                <td className="num pr-3">
                  {p.name}
                  {p.required ? " *" : ""}
                </td>
                <td className="pr-3">{p.in}</td>
                <td className="num pr-3 break-all">{typeOf(p)}</td>
                <td>{p.description ?? ""}</td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : null}
      {json ? (
        <details className="mt-3">
          <summary className="cursor-pointer text-sm font-medium">Request body (JSON schema)</summary>
          <JsonBlock value={json.schema} />
        </details>
      ) : null}
      <Examples media={json} />
      <h4 className="mt-3 text-sm font-medium">Answers</h4>
      <ul className="text-sm">
        {Object.entries(op.responses).map(([status, r]) => (
          <li key={status} className="mt-1">
            <span className="num font-medium">{status}</span>{" "}
            {r.$ref ? (
              <a className="underline" href={`#errors`}>
                see errors
              </a>
            ) : (
              r.description
            )}
            {r.content?.["application/json"]?.schema ? (
              <details>
                <summary className="cursor-pointer text-stone-600">Schema</summary>
                <JsonBlock value={r.content["application/json"].schema} />
              </details>
            ) : null}
            <Examples media={r.content?.["application/json"]} />
          </li>
        ))}
      </ul>
    </article>
  );
}
