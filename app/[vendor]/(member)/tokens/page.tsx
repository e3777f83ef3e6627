import { ActionForm } from "@/components/drafting/action-form";
import { CreateTokenForm } from "@/components/drafting/create-token-form";
import { formatDate } from "@/components/library/format-date";
import { PageHeader } from "@/components/ui/page-header";
import { requirePageAccess } from "@/lib/auth/page-access";
import { listPersonalTokens } from "@/lib/auth/personal-access-tokens";
import { ROLE_LABELS } from "@/lib/auth/roles";

import { createTokenAction, revokeTokenAction } from "./actions";

export const metadata = { title: "API tokens" };

export default async function TokensPage({ params }: { params: Promise<{ vendor: string }> }) {
  const { vendor: slug } = await params;
  const { vendor, user, member } = await requirePageAccess(slug, "tokens.manage", `/${slug}/tokens`);
  const tokens = user ? await listPersonalTokens({ vendorId: vendor.id, userId: user.id }) : [];
  return (
    <>
      <PageHeader
        title="Personal access tokens"
        lead={
          <>
            For scripts that call the {vendor.name} API as you. A token can do what your role ({member ? ROLE_LABELS[member.role] : "—"})
            can, in this vendor only.
          </>
        }
      />
      <CreateTokenForm vendorSlug={vendor.slug} action={createTokenAction} />
      <h2 className="mb-2 mt-8 text-lg font-semibold">Your tokens</h2>
      {tokens.length === 0 ? (
        <p className="text-sm text-stone-600">No tokens yet.</p>
      ) : (
        <ul className="divide-y divide-stone-200 rounded-md border border-stone-300 bg-white">
          {tokens.map((t) => (
            <li key={t.id} className="flex flex-wrap items-center gap-x-4 gap-y-2 px-4 py-3 text-sm">
              <span className="font-medium">{t.name}</span>
              <span className="num text-stone-600">{t.prefix}…</span>
              <span className="text-stone-600">
                created {formatDate(t.createdAt)} · last used {formatDate(t.lastUsedAt)}
              </span>
              {t.revokedAt ? (
                <span className="text-stone-700">⊘ revoked {formatDate(t.revokedAt)}</span>
              ) : (
                <span className="ml-auto">
                  <ActionForm
                    action={revokeTokenAction}
                    hidden={{ vendor: vendor.slug, id: t.id }}
                    submitLabel="Revoke"
                    variant="danger"
                    label={`Revoke ${t.name}`}
                  />
                </span>
              )}
            </li>
          ))}
        </ul>
      )}
    </>
  );
}
