/** Shown on every page of an installation running on demo data. */
export function DemoNotice() {
  return (
    <div role="note" aria-label="Demo data" className="border-b border-caution/40 bg-caution-soft">
      <p className="mx-auto max-w-page px-4 py-1.5 text-center text-sm text-ink sm:px-6">
        <strong className="font-semibold">Demo data:</strong> all sources, people and places here are fictional.
      </p>
    </div>
  );
}
