import { MAIL_KIND_TEXTS, type MailKind } from "@/lib/mail-preferences/mail-kinds";

type Props = {
  vendorSlug: string;
  token?: string;
  kinds: MailKind[];
  choices: Record<MailKind, boolean>;
  saveMailPreferencesAction: (form: FormData) => Promise<void>;
};

/** One box per kind of mail this person can get; works without JavaScript. */
export function MailPreferencesForm({ vendorSlug, token, kinds, choices, saveMailPreferencesAction }: Props) {
  return (
    <form action={saveMailPreferencesAction} className="max-w-2xl space-y-3">
      <input type="hidden" name="vendor" value={vendorSlug} />
      {token ? <input type="hidden" name="token" value={token} /> : null}
      <fieldset className="space-y-3 rounded-md border border-stone-300 bg-white p-4">
        <legend className="px-1 font-semibold">Send me</legend>
        {kinds.map((kind) => (
          <div key={kind} className="flex items-start gap-3">
            <input
              id={`mail-${kind}`}
              type="checkbox"
              name={kind}
              defaultChecked={choices[kind]}
              className="mt-1 h-5 w-5"
              aria-describedby={`mail-${kind}-text`}
            />
            <div>
              <label htmlFor={`mail-${kind}`} className="font-medium">
                {MAIL_KIND_TEXTS[kind].label}
              </label>
              <p id={`mail-${kind}-text`} className="text-sm text-stone-600">
                {MAIL_KIND_TEXTS[kind].description}
              </p>
            </div>
          </div>
        ))}
      </fieldset>
      <button type="submit" className="min-h-11 rounded bg-[var(--vendor-accent)] px-4 font-medium text-[var(--vendor-accent-ink)]">
        Save mail preferences
      </button>
    </form>
  );
}
