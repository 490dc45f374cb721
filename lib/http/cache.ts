import { createHash } from "node:crypto";
import { readFileSync } from "node:fs";
import path from "node:path";
import { Client } from "pg";
import { QueryTypes } from "sequelize";
import { sequelize } from "@/db/sequelize";
import { env } from "@/lib/env";

/**
 * Caching a CDN (and the browser) can use, for the answers that are the same for everyone: the catalogue's parts and
 * look-ups, and the calculators. Each answer carries an ETag made of the build, the catalogue's version (for answers
 * that read the catalogue) and the address asked; a request that sends the ETag it has back in If-None-Match gets a
 * 304 without the answer being worked out again. A change to the catalogue raises its version when it commits
 * (migration 0014), which changes every catalogue ETag at once. Anything personal is `private, no-store` (handle()).
 */

/** The build: a calculator's answer changes only with the code. Read once; "development" under `next dev`. */
let build: string | undefined;
function buildId(): string {
  if (build === undefined) {
    try {
      const dir = process.env.NEXT_DIST_DIR || ".next";
      build = readFileSync(path.join(process.cwd(), dir, "BUILD_ID"), "utf8").trim();
    } catch {
      build = "development";
    }
  }
  return build;
}

const VERSION_SQL = "SELECT version FROM catalogue_version WHERE id = 1";

async function readVersion(): Promise<string> {
  const [row] = await sequelize.query<{ version: string }>(VERSION_SQL, {
    type: QueryTypes.SELECT,
  });
  return String(row?.version ?? "0");
}

/**
 * The catalogue's version as this server last heard it: one connection listens for the version announced at each
 * commit (migration 0016), so a request costs no query. While that connection is not up (starting, or lost with the
 * database), the version is read with each request instead, and the listener tries again a second later.
 */
let heard: string | undefined;
let listening = false;

function listen(): void {
  if (listening) return;
  listening = true;
  const client = new Client({ connectionString: env.DATABASE_URL });
  const lost = () => {
    heard = undefined;
    client.removeAllListeners();
    client.on("error", () => undefined);
    void client.end().catch(() => undefined);
    setTimeout(() => {
      listening = false;
    }, 1_000).unref();
  };
  client.on("error", lost);
  client.on("end", lost);
  client.on("notification", (message) => {
    if (message.channel === "catalogue_version" && message.payload) heard = message.payload;
  });
  void (async () => {
    try {
      await client.connect();
      await client.query("LISTEN catalogue_version");
      // Read after listening, so that no change falls between the two.
      const { rows } = await client.query<{ version: string }>(VERSION_SQL);
      heard ??= String(rows[0]?.version ?? "0");
    } catch {
      lost();
    }
  })();
}

export async function catalogueVersion(): Promise<string> {
  // With read replicas the version is read where the answer's data is read (a replica, or the primary for a browser
  // that has just written), so that an ETag never names data the replica does not have yet.
  if (env.DATABASE_READ_URLS.length > 0) return readVersion();
  listen();
  return heard ?? readVersion();
}

export const CACHE_CONTROL = {
  /**
   * A CDN keeps a catalogue answer a minute and may serve it stale while it refreshes; a browser asks again each
   * time (a 304 when nothing changed), so a person who has just changed the catalogue sees the change.
   */
  catalogue: "public, max-age=0, s-maxage=60, stale-while-revalidate=600",
  /** A calculator's answer changes only with a new build. */
  calculator: "public, max-age=3600, stale-while-revalidate=86400",
  personal: "private, no-store",
} as const;

function etagMatches(header: string | null, etag: string): boolean {
  if (!header) return false;
  return header.split(",").some((tag) => tag.trim().replace(/^W\//, "") === etag.replace(/^W\//, ""));
}

/**
 * A public JSON answer with its ETag: 304 when the asker already has it, otherwise `answer()` worked out and sent.
 * `readsCatalogue` puts the catalogue's version in the ETag.
 */
export async function publicJson(
  request: Request,
  options: { readsCatalogue: boolean },
  answer: () => unknown | Promise<unknown>,
): Promise<Response> {
  const url = new URL(request.url);
  const version = options.readsCatalogue ? await catalogueVersion() : "-";
  const digest = createHash("sha256").update(`${url.pathname}?${url.searchParams}`).digest("base64url").slice(0, 22);
  const etag = `W/"${buildId()}.${version}.${digest}"`;
  const headers = {
    ETag: etag,
    "Cache-Control": options.readsCatalogue ? CACHE_CONTROL.catalogue : CACHE_CONTROL.calculator,
  };
  if (etagMatches(request.headers.get("if-none-match"), etag)) return new Response(null, { status: 304, headers });
  return Response.json(await answer(), { headers });
}
