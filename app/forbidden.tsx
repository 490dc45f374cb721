import Link from "next/link";

export default function Forbidden() {
  return (
    <div className="max-w-2xl space-y-4">
      <p className="num text-brass-deep">403</p>
      <h1 className="text-3xl">This area is not open to your account</h1>
      <p className="text-ink-soft">
        It belongs to another role (moderators review proposals; admins import data). If you think you should have
        access, ask your club&apos;s admin.
      </p>
      <Link href="/">Back to finding a part</Link>
    </div>
  );
}
