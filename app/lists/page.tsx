import type { Metadata } from "next";
import Link from "next/link";
import { NewListForm } from "@/components/lists/new-list-form";
import { Notice } from "@/components/ui/notice";
import { requirePagePermission } from "@/lib/auth/session";
import { machineChoices } from "@/lib/catalogue/browse";
import { jobListsOf } from "@/lib/lists/lists";

export const metadata: Metadata = { title: "Job lists" };

export default async function ListsPage() {
  const user = await requirePagePermission("lists:manage", "/lists");
  const [lists, machines] = await Promise.all([jobListsOf(user.id), machineChoices()]);
  return (
    <div className="grid gap-8 lg:grid-cols-[1fr_24rem]">
      <div className="space-y-4">
        <header className="space-y-1">
          <h1 className="text-3xl">Job lists</h1>
          <p className="text-ink-soft">
            A parts list for each job, to order by standard numbers. Only you see your lists, unless you share one by
            its link.
          </p>
        </header>
        {lists.length === 0 ? (
          <Notice>No lists yet. Start one for the job on your bench.</Notice>
        ) : (
          <ul className="space-y-3">
            {lists.map((l) => (
              <li key={l.id} className="rounded-lg border border-rule bg-ground-raised p-4" data-testid="job-list">
                <Link href={`/lists/${l.id}`} className="text-xl font-bold">
                  {l.title}
                </Link>
                <p className="text-sm text-ink-soft">
                  {l.machine ? `${l.machine} · ` : ""}
                  {l.lines} {l.lines === 1 ? "line" : "lines"}, {l.quantity} parts · changed {l.updatedAt.slice(0, 10)}
                  {l.shared ? " · shared by link" : ""}
                </p>
              </li>
            ))}
          </ul>
        )}
      </div>
      <NewListForm machines={machines} />
    </div>
  );
}
