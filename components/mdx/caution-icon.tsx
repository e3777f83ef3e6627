/** A warning triangle; decorative, the caution's word carries the meaning. */
export function CautionIcon() {
  return (
    <svg aria-hidden="true" focusable="false" viewBox="0 0 20 20" className="h-5 w-5 shrink-0 fill-current">
      <path d="M10 1.5 19 18H1L10 1.5Zm0 3.6L3.9 16.2h12.2L10 5.1Zm-1 3.4h2v4h-2v-4Zm0 5h2v2h-2v-2Z" />
    </svg>
  );
}
