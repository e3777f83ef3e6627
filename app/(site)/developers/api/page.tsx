import { JsonBlock } from "@/components/developers/json-block";
import { OperationCard, type OperationDoc } from "@/components/developers/operation-card";
import { WebhookVerifyExample } from "@/components/developers/webhook-verify-example";
import { SafeMarkdown } from "@/components/support/safe-markdown";
import { PageHeader } from "@/components/ui/page-header";
import { openApiDocument } from "@/lib/api-docs/openapi-document";
import { PERMISSIONS } from "@/lib/auth/permissions";

export const metadata = { title: "API reference" };

// The readable form of /api/v1/openapi.json: everything here comes from that document.
export default function ApiReferencePage() {
  const doc = openApiDocument();
  const byTag = new Map<string, { method: string; path: string; op: OperationDoc }[]>();
  for (const [path, methods] of Object.entries(doc.paths)) {
    for (const [method, op] of Object.entries(methods) as [string, OperationDoc & { tags: string[] }][]) {
      const tag = op.tags[0];
      byTag.set(tag, [...(byTag.get(tag) ?? []), { method: method.toUpperCase(), path, op }]);
    }
  }
  return (
    <>
      <PageHeader
        title="API reference"
        lead={
          <>
            For integrators: every endpoint of the JSON API, its scope, limits and examples. The same as{" "}
            <a className="underline" href="/api/v1/openapi.json">
              /api/v1/openapi.json
            </a>{" "}
            (OpenAPI 3.1), for generating a client.
          </>
        }
      />
      <section className="prose-sm mb-8 max-w-3xl">
        <SafeMarkdown source={doc.info.description} />
      </section>
      <nav aria-label="Sections" className="mb-8 text-sm">
        <ul className="flex flex-wrap gap-3">
          {[...byTag.keys(), "Token scopes", "Errors", "Webhooks"].map((t) => (
            <li key={t}>
              <a className="underline" href={`#${slug(t)}`}>
                {t}
              </a>
            </li>
          ))}
        </ul>
      </nav>
      <section id="token-scopes" className="mb-8">
        <h2 className="mb-3 text-lg font-semibold">Token scopes</h2>
        <p className="mb-2 text-sm text-stone-700">
          A token carries its owner&apos;s role in one vendor; an endpoint&apos;s scope is the permission it needs.
        </p>
        <table className="text-left text-sm">
          <thead>
            <tr>
              <th className="pr-4">Scope</th>
              <th>Roles that hold it</th>
            </tr>
          </thead>
          <tbody>
            {Object.entries(PERMISSIONS).map(([p, roles]) => (
              <tr key={p} className="border-t border-stone-100">
                <td className="num pr-4">{p}</td>
                <td>{roles.join(", ")}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </section>
      {[...byTag.entries()].map(([tag, ops]) => (
        <section key={tag} id={slug(tag)} className="mb-8">
          <h2 className="mb-3 text-lg font-semibold">{tag}</h2>
          {ops.map((o) => (
            <OperationCard key={`${o.method} ${o.path}`} {...o} />
          ))}
        </section>
      ))}
      <section id="errors" className="mb-8">
        <h2 className="mb-3 text-lg font-semibold">Errors</h2>
        <ul className="mb-3 text-sm">
          {Object.entries(doc.components.responses).map(([name, r]) => (
            <li key={name}>
              <span className="num font-medium">{name.slice(1)}</span> {r.description}
            </li>
          ))}
        </ul>
        <JsonBlock label="ApiError" value={doc.components.schemas.ApiError} />
      </section>
      <section id="webhooks" className="mb-8">
        <h2 className="mb-3 text-lg font-semibold">Webhooks</h2>
        <p className="mb-3 text-sm text-stone-700">
          A vendor&apos;s admins add webhooks under Admin → Integrations. The signing secret is shown once, when the webhook is added.
        </p>
        <WebhookVerifyExample />
        {Object.entries(doc.webhooks).map(([type, entry]) => {
          const post = (entry as { post: { summary: string; requestBody: { content: { "application/json": { schema: unknown } } } } }).post;
          return (
            <article key={type} id={`event-${type}`} className="mb-4 rounded-lg border border-stone-200 bg-white p-4">
              <h3 className="font-semibold">
                <code>{type}</code>
              </h3>
              <p className="text-sm">{post.summary}.</p>
              <details>
                <summary className="cursor-pointer text-sm text-stone-600">Body (JSON schema)</summary>
                <JsonBlock value={post.requestBody.content["application/json"].schema} />
              </details>
            </article>
          );
        })}
      </section>
    </>
  );
}

const slug = (text: string) => text.toLowerCase().replace(/[^a-z0-9]+/g, "-");
