"use client";

export default function ErrorPage({ reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <div className="max-w-2xl space-y-4">
      <h1 className="text-3xl">Something went wrong on our side</h1>
      <p className="text-ink-soft">Nothing you entered was lost by reading this page. Try again in a moment.</p>
      <button
        type="button"
        onClick={reset}
        className="min-h-12 rounded-md bg-ink px-5 font-bold text-ground hover:bg-ink-soft"
      >
        Try again
      </button>
    </div>
  );
}
