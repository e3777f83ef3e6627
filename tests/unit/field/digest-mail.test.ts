import { describe, expect, it } from "vitest";

import { renderDigest, type DigestMail } from "@/lib/field/digest-mail";

type Attention = DigestMail["attention"][number];

const attentionItem = (overrides: Partial<Attention> = {}): Attention => ({
  title: "Aluminium 6082, 6 mm 3-flute",
  number: 3,
  failed: 4,
  outcomes: 11,
  lowerPct: "15 %",
  upperPct: "65 %",
  symptom: "Chatter",
  url: "https://swarf.example/acme/drafting/field/al-6082-6mm",
  ...overrides,
});

const digest = (overrides: Partial<DigestMail> = {}): DigestMail => ({
  attentionTotal: (overrides.attention ?? [null]).length,
  moreGaps: 0,
  machines: 40,
  vendorName: "Acme Tools",
  weekOf: "2026-12-07",
  confidenceLabel: "95 %",
  fieldUrl: "https://swarf.example/acme/drafting/field",
  stopUrl: "https://swarf.example/api/v1/vendors/acme/field/digest/stop?token=abc.def",
  attention: [attentionItem()],
  changes: [{ title: "Brass, 3 mm", number: 2, sentence: "vf (feed rate) lowered by a median of 18 % in 23 reports" }],
  gaps: ["31 machines with max 12,000 rpm, 0.5–1 kW and a light frame: no class covers them."],
  ...overrides,
});

describe("renderDigest: more than the digest lists", () => {
  it("counts every flagged version in the subject and says the list is the top of them", () => {
    const mail = renderDigest(digest({ attentionTotal: 40 }));
    expect(mail.subject).toContain(": 40 versions need attention");
    expect(mail.text).toContain("the top 1 of 40");
  });

  it("points to the page for the clusters it leaves out", () => {
    expect(renderDigest(digest({ moreGaps: 3 })).text).toContain("… and 3 more clusters on the Field results page.");
    expect(renderDigest(digest({ moreGaps: 0 })).text).not.toContain("more cluster");
  });

  it("does not claim full coverage when no machine is registered", () => {
    const mail = renderDigest(digest({ machines: 0, gaps: [] }));
    expect(mail.text).toContain("No customer has registered a machine yet.");
    expect(mail.text).not.toContain("Every registered machine");
  });
});

describe("renderDigest: subject", () => {
  it("counts the versions that need attention (plural)", () => {
    expect(renderDigest(digest({ attention: [attentionItem(), attentionItem({ number: 4 })] })).subject).toBe(
      "Field results for Acme Tools, week of 2026-12-07: 2 versions need attention",
    );
  });

  it("uses the singular for one version", () => {
    expect(renderDigest(digest()).subject).toBe("Field results for Acme Tools, week of 2026-12-07: 1 version needs attention");
  });

  it("says 0 versions when nothing needs attention", () => {
    expect(renderDigest(digest({ attention: [] })).subject).toBe(
      "Field results for Acme Tools, week of 2026-12-07: 0 versions need attention",
    );
  });
});

describe("renderDigest: text", () => {
  it("lists the attention items ranked, with interval, symptom and link", () => {
    const { text } = renderDigest(digest());
    expect(text).toContain(
      "1. Aluminium 6082, 6 mm 3-flute, version 3: failed in 4 of 11 reports (95 % interval 15 %–65 %), mostly chatter\n   https://swarf.example/acme/drafting/field/al-6082-6mm",
    );
    expect(text).toContain("- Brass, 3 mm, version 2: vf (feed rate) lowered by a median of 18 % in 23 reports");
    expect(text).toContain("- 31 machines with max 12,000 rpm");
  });

  it("leaves out the symptom when there is none", () => {
    const { text } = renderDigest(digest({ attention: [attentionItem({ symptom: null })] }));
    expect(text).toContain("(95 % interval 15 %–65 %)\n");
    expect(text).not.toContain("mostly");
  });

  it("carries the stop link and the field link", () => {
    const { text } = renderDigest(digest());
    expect(text).toContain("Stop the weekly digest: https://swarf.example/api/v1/vendors/acme/field/digest/stop?token=abc.def");
    expect(text).toContain("Open Field results: https://swarf.example/acme/drafting/field");
  });

  it("says no customer is named", () => {
    expect(renderDigest(digest()).text).toContain("Aggregates only: no customer is named.");
  });

  it("empty lists give the empty sentences", () => {
    const { text } = renderDigest(digest({ attention: [], changes: [], gaps: [] }));
    expect(text).toContain("Nothing failed on a published version.");
    expect(text).toContain("No “worked after changes” reports yet.");
    expect(text).toContain("Every registered machine falls inside a machine class you publish for.");
  });

  it("non-empty lists do not show the empty sentences", () => {
    const { text, html } = renderDigest(digest());
    for (const out of [text, html]) {
      expect(out).not.toContain("Nothing failed on a published version.");
      expect(out).not.toContain("reports yet.");
      expect(out).not.toContain("Every registered machine falls inside");
    }
  });
});

describe("renderDigest: html", () => {
  const nasty = "<script>alert('x')</script> & \"co\"";

  it("escapes HTML in attention titles", () => {
    const { html } = renderDigest(digest({ attention: [attentionItem({ title: nasty })] }));
    expect(html).not.toContain("<script>");
    expect(html).toContain("&#60;script&#62;alert(&#39;x&#39;)&#60;/script&#62; &#38; &#34;co&#34;, version 3</a>");
  });

  it("escapes HTML in change titles and sentences, gaps and the vendor name", () => {
    const { html } = renderDigest(
      digest({
        vendorName: "<b>Acme</b>",
        changes: [{ title: nasty, number: 2, sentence: "<img src=x onerror=alert(1)>" }],
        gaps: ["<iframe>"],
      }),
    );
    expect(html).not.toMatch(/<script|<img|<iframe|<b>Acme/);
    expect(html).toContain("<strong>&#60;b&#62;Acme&#60;/b&#62;</strong>");
    expect(html).toContain("&#60;img src=x onerror=alert(1)&#62;");
    expect(html).toContain("<li>&#60;iframe&#62;</li>");
  });

  it("escapes the symptom and the links", () => {
    const { html } = renderDigest(digest({ attention: [attentionItem({ symptom: "<Tool>", url: 'https://x.example/a?b=1&c="2"' })] }));
    expect(html).toContain(", mostly &#60;tool&#62;");
    expect(html).toContain('<a href="https://x.example/a?b=1&#38;c=&#34;2&#34;">');
  });

  it("carries the stop link as an anchor", () => {
    const { html } = renderDigest(digest());
    expect(html).toContain(
      '<p><a href="https://swarf.example/api/v1/vendors/acme/field/digest/stop?token=abc.def">Stop the weekly digest</a></p>',
    );
    expect(html).toContain('<a href="https://swarf.example/acme/drafting/field">Open Field results</a>');
  });

  it("says no customer is named", () => {
    expect(renderDigest(digest()).html).toContain("Aggregates only: no customer is named.");
  });

  it("renders the lists as <ul> items", () => {
    const { html } = renderDigest(digest({ attention: [attentionItem(), attentionItem({ number: 4 })] }));
    expect(html.match(/<li><a href=/g)).toHaveLength(2);
  });

  it("empty lists give the empty sentences as paragraphs", () => {
    const { html } = renderDigest(digest({ attention: [], changes: [], gaps: [] }));
    expect(html).toContain("<p>Nothing failed on a published version.</p>");
    expect(html).toContain("<p>No “worked after changes” reports yet.</p>");
    expect(html).toContain("<p>Every registered machine falls inside a machine class you publish for.</p>");
    expect(html).not.toContain("<ul>");
  });
});
