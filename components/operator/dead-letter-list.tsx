import { SubmitButton } from "@/components/forms/submit-button";
import type { DeadLetter, DeadLetterSummary } from "@/lib/mail/dead-letters";

const when = (d: Date) => d.toISOString().slice(0, 16).replace("T", " ");

/** The operator's two server actions, passed down by the page. */
export type DeadLetterActions = {
  retryDeadLettersAction: (form: FormData) => Promise<void>;
  discardDeadLettersAction: (form: FormData) => Promise<void>;
};

function Buttons({ id, retryDeadLettersAction, discardDeadLettersAction }: { id?: string } & DeadLetterActions) {
  return (
    <div className="flex gap-2">
      <form action={retryDeadLettersAction}>
        <input type="hidden" name="id" value={id ?? ""} />
        <SubmitButton variant="quiet" pendingText="Queueing…">
          {id ? "Retry" : "Retry all"}
        </SubmitButton>
      </form>
      <form action={discardDeadLettersAction}>
        <input type="hidden" name="id" value={id ?? ""} />
        <SubmitButton variant="danger" pendingText="Discarding…">
          {id ? "Discard" : "Discard all"}
        </SubmitButton>
      </form>
    </div>
  );
}

/** Mail that could not be delivered within the retry window: what, since when, why, and what to do. */
export function DeadLetterList({
  summary,
  letters,
  actions,
}: {
  summary: DeadLetterSummary;
  letters: DeadLetter[];
  actions: DeadLetterActions;
}) {
  if (!summary.count)
    return <p className="text-sm text-stone-600">No undelivered e-mail. Mail that fails for the whole retry window would wait here.</p>;
  return (
    <div className="space-y-3" aria-label="Undelivered e-mail">
      <dl className="grid grid-cols-3 gap-3 text-sm">
        <div>
          <dt className="text-stone-600">Undelivered</dt>
          <dd className="num text-lg font-semibold">{summary.count}</dd>
        </div>
        <div>
          <dt className="text-stone-600">Oldest</dt>
          <dd className="num">{summary.oldest ? when(summary.oldest) : "–"}</dd>
        </div>
        <div>
          <dt className="text-stone-600">Last error</dt>
          <dd className="break-words">{summary.lastError ?? "–"}</dd>
        </div>
      </dl>
      <Buttons {...actions} />
      <table className="w-full rounded-lg border border-stone-200 bg-white text-left text-sm">
        <thead className="bg-stone-100">
          <tr>
            <th className="px-3 py-2">To</th>
            <th className="px-3 py-2">Subject</th>
            <th className="px-3 py-2">Failed</th>
            <th className="px-3 py-2">Error</th>
            <th className="px-3 py-2">
              <span className="sr-only">Actions</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {letters.map((l) => (
            <tr key={l.id} className="border-t border-stone-100 align-top">
              <td className="px-3 py-2">{l.to}</td>
              <td className="px-3 py-2">{l.subject}</td>
              <td className="num px-3 py-2">{when(l.failedAt)}</td>
              <td className="px-3 py-2">{l.error ?? "–"}</td>
              <td className="px-3 py-2">
                <Buttons id={l.id} {...actions} />
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
