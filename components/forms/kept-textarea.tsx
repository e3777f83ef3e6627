"use client";

import { useState, type ComponentProps } from "react";

import { useTypedBeforeHydration } from "./use-kept-text";

type Props = Omit<ComponentProps<"textarea">, "defaultValue" | "value" | "id"> & { id: string; defaultValue: string };

/**
 * An uncontrolled textarea with server text that keeps what the user typed before the page hydrated. Once the
 * text it is given changes (a refused form's values, a newer version), that text is shown as usual.
 */
export function KeptTextarea({ id, defaultValue, ...rest }: Props) {
  const [first] = useState(defaultValue);
  const typed = useTypedBeforeHydration(id, defaultValue);
  return <textarea id={id} defaultValue={defaultValue === first ? typed : defaultValue} {...rest} />;
}
