import Link from "next/link";

import { LATEST_THREAD_MESSAGES, type ThreadMessages } from "@/content-schema/api-queries";

/**
 * Between the question and the thread: how much of a long thread is folded away, with a plain link (no script needed)
 * to unfold it, or to fold it again.
 */
export function ThreadFold({
  threadPath,
  messages,
  shown,
  earlierCount,
}: {
  threadPath: string;
  messages: ThreadMessages;
  shown: number;
  earlierCount: number;
}) {
  const folded = messages === "latest" && earlierCount > 0;
  if (!folded && shown <= LATEST_THREAD_MESSAGES) return null;
  return (
    <p className="rounded-lg border border-dashed border-stone-300 px-4 py-2 text-sm text-stone-600" data-thread-fold>
      {folded ? (
        <>
          <span className="num">{earlierCount}</span> {earlierCount === 1 ? "earlier message" : "earlier messages"} folded away; the latest{" "}
          <span className="num">{shown}</span> follow.{" "}
          <Link className="text-accent font-medium underline underline-offset-2" href={`${threadPath}?messages=all`}>
            Unfold all {earlierCount + shown}
          </Link>
        </>
      ) : (
        <>
          Whole thread, <span className="num">{shown}</span> messages.{" "}
          <Link className="text-accent font-medium underline underline-offset-2" href={threadPath}>
            Fold to the latest {LATEST_THREAD_MESSAGES}
          </Link>
        </>
      )}
    </p>
  );
}
