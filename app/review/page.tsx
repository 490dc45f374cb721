import type { Metadata } from "next";
import Link from "next/link";
import { QueueTable } from "@/components/review/queue-table";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { SelectField } from "@/components/ui/select-field";
import { requirePagePermission } from "@/lib/auth/session";
import { CATEGORY_NAMES, PART_CATEGORIES } from "@/lib/catalogue/kinds";
import { makerChoices } from "@/lib/catalogue/browse";
import { reviewQueue } from "@/lib/proposals/views";
import { queuePageQuery } from "@/lib/validation/proposals";

export const metadata: Metadata = { title: "Review queue" };

const DONE: Record<string, string> = {
  approved: "Approved: the cross is in the catalogue now, and the member has been told.",
  rejected: "Rejected: the member has been told why.",
  changes_requested: "Sent back: the member has been asked for the change.",
};

const PAGE_SIZE = 50;

export default async function ReviewQueuePage({
  searchParams,
}: {
  searchParams: Promise<{ category?: string; maker?: string; q?: string; done?: string; page?: string }>;
}) {
  await requirePagePermission("proposals:review", "/review");
  const params = await searchParams;
  const { category, maker: makerId, q, page } = queuePageQuery.parse(params);
  const [makers, queue] = await Promise.all([
    makerChoices(),
    reviewQueue({ category, makerId, q, limit: PAGE_SIZE, offset: (page - 1) * PAGE_SIZE }),
  ]);
  const pages = Math.max(1, Math.ceil(queue.total / PAGE_SIZE));
  const pageLink = (n: number) =>
    `/review?${new URLSearchParams({
      ...(category ? { category } : {}),
      ...(makerId ? { maker: String(makerId) } : {}),
      ...(q ? { q } : {}),
      page: String(n),
    })}`;

  return (
    <div className="space-y-6">
      <header className="space-y-1">
        <h1 className="text-3xl">Review queue</h1>
        <p className="max-w-3xl text-ink-soft">
          Members&apos; proposals waiting for a decision, oldest first. Open one to see it beside what the catalogue
          already says. Nothing reaches the catalogue until it is approved; you cannot decide your own.
        </p>
      </header>
      {params.done && DONE[params.done] && (
        <Notice tone="success" role="status">
          {DONE[params.done]}
        </Notice>
      )}
      <form
        method="get"
        className="flex flex-wrap items-end gap-4 rounded-lg border border-rule bg-ground-raised p-4"
        aria-label="Filter the queue"
      >
        <SelectField
          id="category"
          label="Kind of part"
          name="category"
          defaultValue={category ?? ""}
          className="min-w-48"
        >
          <option value="">All kinds</option>
          {PART_CATEGORIES.map((c) => (
            <option key={c} value={c}>
              {CATEGORY_NAMES[c]}
            </option>
          ))}
        </SelectField>
        <SelectField id="maker" label="Maker" name="maker" defaultValue={makerId ?? ""} className="min-w-48">
          <option value="">All makers</option>
          {makers.map((m) => (
            <option key={m.id} value={m.id}>
              {m.name}
            </option>
          ))}
        </SelectField>
        <div className="min-w-56 flex-1">
          <Field id="q" label="Number, designation or member" name="q" type="search" defaultValue={q ?? ""} />
        </div>
        <Button type="submit" variant="secondary">
          Show
        </Button>
      </form>
      <p className="font-bold">
        {queue.total} {queue.total === 1 ? "proposal is" : "proposals are"} waiting
        {category || makerId || q ? " with these filters" : ""}.
        {pages > 1 && ` Page ${page} of ${pages}, ${PAGE_SIZE} to a page, oldest first.`}
      </p>
      {queue.rows.length === 0 ? <Notice>Nothing is waiting. Thank you.</Notice> : <QueueTable rows={queue.rows} />}
      {pages > 1 && (
        <nav aria-label="Pages of the queue" className="flex flex-wrap gap-4">
          {page > 1 && <Link href={pageLink(page - 1)}>← Previous page</Link>}
          {page < pages && <Link href={pageLink(page + 1)}>Next page →</Link>}
        </nav>
      )}
    </div>
  );
}
