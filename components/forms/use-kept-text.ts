import { useState, useSyncExternalStore, type SetStateAction } from "react";

const subscribeNothing = () => () => {};

/**
 * What the user typed into the server-rendered textarea `id` before the page hydrated, else `serverText`.
 *
 * React keeps what was typed into an input before the page hydrated, but sets a textarea back to its server text
 * (react-dom 19.3, `initTextarea`), so words typed while the page's scripts were still loading vanished and the old
 * text was sent instead. Only while hydrating (the server snapshot below is read then, never on a later client
 * mount, where another page's textarea of the same id may still be in the document) is the element read, in the
 * state initializer, before React touches it; and only if its default text is still `serverText`.
 */
export function useTypedBeforeHydration(id: string, serverText: string): string {
  const hydrating = useSyncExternalStore(
    subscribeNothing,
    () => false,
    () => true,
  );
  const [typed] = useState(() => {
    // On the server the snapshot says "hydrating" too, but there is no document to read.
    if (!hydrating || typeof document === "undefined") return serverText;
    const element = document.getElementById(id);
    return element instanceof HTMLTextAreaElement && element.defaultValue === serverText ? element.value : serverText;
  });
  return typed;
}

/**
 * State for a controlled textarea that keeps what was typed before the page hydrated. It hydrates with the server
 * text (what the page derives from it, line numbers or a preview, must match the server's HTML, or React throws
 * the server's HTML away and the typed text with it), and takes the typed text in the render that follows.
 */
export function useKeptText(id: string, serverText: string) {
  const typed = useTypedBeforeHydration(id, serverText);
  const hydrated = useSyncExternalStore(
    subscribeNothing,
    () => true,
    () => false,
  );
  const [edited, setEdited] = useState<string | null>(null);
  const text = edited ?? (hydrated ? typed : serverText);
  const setText = (next: SetStateAction<string>) => setEdited((previous) => (typeof next === "function" ? next(previous ?? typed) : next));
  return [text, setText] as const;
}
