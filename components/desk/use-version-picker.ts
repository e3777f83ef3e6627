"use client";

import { useEffect, useState } from "react";

import type { PickerPage } from "@/lib/desk/picker-versions";
import { useApiJson } from "@/lib/swr/use-api-json";

const TYPING_PAUSE_MS = 250;

/**
 * The reply editor's sheet-version lookup: the first current versions until words are typed, then the versions
 * the server finds for them (a vendor's catalogue can hold thousands), asked once typing pauses.
 */
export function useVersionPicker(vendor: string, first: PickerPage) {
  const [query, setQuery] = useState("");
  const [asked, setAsked] = useState("");
  useEffect(() => {
    const timer = setTimeout(() => setAsked(query.trim()), TYPING_PAUSE_MS);
    return () => clearTimeout(timer);
  }, [query]);
  const found = useApiJson<PickerPage>(asked ? `/api/v1/vendors/${vendor}/desk/sheet-versions?q=${encodeURIComponent(asked)}` : null, {
    keepPreviousData: true,
    revalidateOnFocus: false,
  });
  const page = asked ? (found.data ?? { versions: [], hasMore: false }) : first;
  const hint =
    found.error && asked
      ? "The lookup did not answer; try again."
      : asked && found.isLoading
        ? "Looking…"
        : asked && !page.versions.length
          ? `No version customers can read matches “${asked}”.`
          : page.hasMore
            ? `Showing the first ${page.versions.length}; type more words to narrow.`
            : "";
  return { query, setQuery, asked, page, hint };
}
