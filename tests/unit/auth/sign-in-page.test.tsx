import { isValidElement, type ReactNode } from "react";
import { describe, expect, it } from "vitest";

import SignInPage from "@/app/(site)/sign-in/page";
import { SignInForms } from "@/components/auth/sign-in-forms";

// The page decides on the server what the form follows after sign-in; find the props it hands the form.
function formProps(node: ReactNode): { callbackUrl: string; vendor?: string } | null {
  if (Array.isArray(node)) return node.map(formProps).find(Boolean) ?? null;
  if (!isValidElement<{ children?: ReactNode; callbackUrl?: string; vendor?: string }>(node)) return null;
  if (node.type === SignInForms) return { callbackUrl: node.props.callbackUrl ?? "", vendor: node.props.vendor };
  return formProps(node.props.children);
}

const render = async (search: Record<string, string>) => formProps(await SignInPage({ searchParams: Promise.resolve(search) }));

describe("sign-in page", () => {
  it("passes a same-site path on", async () => {
    expect(await render({ callbackUrl: "/northbeck/desk?tab=mine", vendor: "northbeck" })).toEqual({
      callbackUrl: "/northbeck/desk?tab=mine",
      vendor: "northbeck",
    });
  });

  it.each(["/\\evil.example", "/\t/evil.example", "//evil.example", "https://evil.example/", "javascript:alert(1)"])(
    "never passes %j on",
    async (callbackUrl) => {
      expect(await render({ callbackUrl, vendor: "/evil.example" })).toEqual({ callbackUrl: "/", vendor: undefined });
    },
  );
});
