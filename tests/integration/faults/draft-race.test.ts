import { NextRequest } from "next/server";
import { describe, expect, it } from "vitest";

import { PUT as putDraft } from "@/app/api/v1/vendors/[vendor]/sheets/[slug]/draft/route";
import { createPersonalToken } from "@/lib/auth/personal-access-tokens";
import { db } from "@/lib/db/knex";
import { DraftConflict, saveDraft } from "@/lib/sheets/save-draft";
import { createDraftingScenario, sourceWithFeed } from "@/tests/factories/sheets";

import { report } from "./support/services";

type Handler = (request: NextRequest, ctx: { params: Promise<Record<string, string>> }) => Promise<Response>;

const put = (vendor: string, slug: string, token: string, body: unknown) =>
  (putDraft as unknown as Handler)(
    new NextRequest(`http://localhost/api/v1/vendors/${vendor}/sheets/${slug}/draft`, {
      method: "PUT",
      headers: { authorization: `Bearer ${token}`, "content-type": "application/json" },
      body: JSON.stringify(body),
    }),
    { params: Promise.resolve({ vendor, slug }) },
  );

describe("fault: two engineers save one draft at once, through the API and the editor", () => {
  it("one save wins, the other gets one conflict carrying the winner's text; nothing is lost or overwritten", async () => {
    const s = await createDraftingScenario();
    const token = (await createPersonalToken({ vendorId: s.vendor.id, userId: s.engineer.user.id, name: "script" })).secret;
    const current = async () =>
      db("sheet_versions")
        .where({ vendor_id: s.vendor.id, id: s.created.versionId })
        .first<{ source: string; revision: number }>("source", "revision");
    const rounds = 12;
    let apiWins = 0;
    let editorWins = 0;
    let conflicts = 0;
    let lost = 0;
    for (let i = 0; i < rounds; i++) {
      const { revision } = await current();
      const apiText = sourceWithFeed(`${1500 + i} mm/min`);
      const editorText = sourceWithFeed(`${1700 + i} mm/min`);
      // The editor's save action calls saveDraft with the revision it opened; the script PUTs the same revision.
      const [api, editor] = await Promise.all([
        put(s.vendor.slug, s.slug, token, { source: apiText, revision }),
        saveDraft({ vendorId: s.vendor.id, userId: s.engineer2.user.id, slug: s.slug, source: editorText, revision }).then(
          (saved) => ({ ok: true as const, saved }),
          (error: unknown) => {
            if (!(error instanceof DraftConflict)) throw error;
            return { ok: false as const, current: error.current.source };
          },
        ),
      ]);
      const stored = (await current()).source;
      const apiBody = await api.json();
      if (api.status === 200 && !editor.ok) {
        apiWins++;
        conflicts++;
        if (stored !== apiText || editor.current !== apiText) lost++;
      } else if (api.status === 409 && editor.ok) {
        editorWins++;
        conflicts++;
        if (stored !== editorText || apiBody.current.source !== editorText) lost++;
      } else {
        lost++;
      }
    }
    // And a PUT that does not say which revision it edits is refused, not applied.
    const before = (await current()).source;
    const blind = await put(s.vendor.slug, s.slug, token, { source: sourceWithFeed("999 mm/min") });
    const after = (await current()).source;

    report("draft-race", { rounds, apiWins, editorWins, conflicts, lostOrOverwritten: lost, putWithoutRevision: blind.status });
    expect(conflicts).toBe(rounds);
    expect(lost).toBe(0);
    expect(blind.status).toBe(428);
    expect(after).toBe(before);
  });
});
