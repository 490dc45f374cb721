import Link from "next/link";

export default function NotFound() {
  return (
    <div className="max-w-2xl space-y-4">
      <p className="num text-brass-deep">404</p>
      <h1 className="text-3xl">Nothing here</h1>
      <p className="text-ink-soft">The address may be mistyped, or the page has moved.</p>
      <Link href="/">Back to finding a part</Link>
    </div>
  );
}
