/** Pretty JSON in a scrollable block (schemas and examples of the API reference). */
export function JsonBlock({ value, label }: { value: unknown; label?: string }) {
  return (
    <figure className="my-2">
      {label ? <figcaption className="mb-1 text-xs font-medium text-stone-600">{label}</figcaption> : null}
      <pre className="max-h-96 overflow-auto rounded border border-stone-200 bg-stone-50 p-3 text-xs leading-relaxed" tabIndex={0}>
        {JSON.stringify(value, null, 2)}
      </pre>
    </figure>
  );
}
