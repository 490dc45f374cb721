import type { Metadata } from "next";
import Link from "next/link";
import { ImportUpload } from "@/components/imports/import-upload";
import { Notice } from "@/components/ui/notice";
import { hasPermission } from "@/lib/auth/roles";
import { requirePagePermission } from "@/lib/auth/session";
import { recentImports, savedMappings } from "@/lib/imports/imports";
import { STATUS_WORDS, TARGET_WORDS } from "@/lib/imports/kinds";

export const metadata: Metadata = { title: "Imports" };

export default async function ImportsPage({ searchParams }: { searchParams: Promise<{ discarded?: string }> }) {
  const { discarded } = await searchParams;
  const user = await requirePagePermission("imports:review-queue", "/admin/imports");
  const [imports, mappings] = await Promise.all([recentImports(user), savedMappings()]);
  const isAdmin = hasPermission(user.role, "imports:commit");
  return (
    <div className="space-y-8">
      <header className="space-y-1">
        <h1 className="text-3xl">Imports</h1>
        <p className="max-w-3xl text-ink-soft">
          Load a club&apos;s or a shop&apos;s interchange spreadsheet. The file is stored as it came, read in a dry run
          that changes nothing, and committed only when you have checked what it would do.{" "}
          {isAdmin
            ? "A committed import can be rolled back as a whole."
            : "As a moderator you import into the review queue, where another moderator decides each row."}
        </p>
      </header>
      {discarded && <Notice tone="success">The import was discarded. Nothing in the catalogue changed.</Notice>}
      <ImportUpload canCommitToCatalogue={isAdmin} mappings={mappings.map((m) => ({ id: m.id, name: m.name }))} />
      <section aria-labelledby="past-heading" className="space-y-3">
        <h2 id="past-heading" className="text-2xl">
          Earlier imports
        </h2>
        {imports.length === 0 ? (
          <Notice>No imports yet.</Notice>
        ) : (
          <div className="overflow-x-auto rounded-lg border border-rule bg-ground-raised">
            <table className="stack-table w-full text-left">
              <thead className="bg-ground-sunk text-sm">
                <tr>
                  <th scope="col" className="p-3">
                    File
                  </th>
                  <th scope="col" className="p-3">
                    State
                  </th>
                  <th scope="col" className="p-3">
                    Into
                  </th>
                  <th scope="col" className="p-3">
                    Rows
                  </th>
                  <th scope="col" className="p-3">
                    By, when (UTC)
                  </th>
                </tr>
              </thead>
              <tbody>
                {imports.map((i) => {
                  const c = i.committedCounts ?? i.counts;
                  return (
                    <tr key={i.id} className="border-t border-rule align-top">
                      <td className="p-3" data-label="File">
                        <Link href={`/admin/imports/${i.id}`} className="font-bold break-all">
                          {i.fileName}
                        </Link>
                      </td>
                      <td className="p-3" data-label="State">
                        {STATUS_WORDS[i.status]}
                      </td>
                      <td className="p-3" data-label="Into">
                        {TARGET_WORDS[i.target]}
                      </td>
                      <td className="p-3 num" data-label="Rows">
                        {c ? `${c.rows} (${c.rejected} rejected)` : "—"}
                      </td>
                      <td className="p-3 text-sm" data-label="By, when (UTC)">
                        {i.by ?? "?"}
                        <span className="block num">{i.createdAt.slice(0, 16).replace("T", " ")}</span>
                      </td>
                    </tr>
                  );
                })}
              </tbody>
            </table>
          </div>
        )}
      </section>
    </div>
  );
}
