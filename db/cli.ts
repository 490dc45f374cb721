import { sequelize } from "@/db";
import { createMigrator } from "@/db/migrator";
import { isCatalogueEmpty, seedDemoCatalogue } from "@/db/seeders/catalogue";
import { isDatabaseEmpty, seedDemo } from "@/db/seeders/demo";
import { seedLargeCatalogue } from "@/db/seeders/large";
import { seedDemoLists } from "@/db/seeders/lists";
import { sendProposalDigest } from "@/lib/proposals/digest";
import { sweepAbandonedPhotos } from "@/lib/proposals/photos";

const usage = `Usage: tsx db/cli.ts <command>
  migrate          apply every pending migration
  migrate:down     revert the latest migration (--all: every one)
  migrate:status   list applied and pending migrations
  seed             load the demo data (refused in production)
  seed:if-empty    load the demo data only into an empty database
  seed:large       load a synthetic catalogue for benchmarks (--parts N, default 250000)
  digest           mail reviewers one summary of the proposals that arrived since the last one
  sweep-photos     delete photos uploaded more than a day ago and never attached to a proposal`;

async function main(command: string | undefined, flags: string[]): Promise<void> {
  const log = (message: string) => console.log(`[db] ${message}`);
  const migrator = createMigrator(sequelize, log);
  switch (command) {
    case "migrate":
      await migrator.up();
      break;
    case "migrate:down":
      await migrator.down(flags.includes("--all") ? { to: 0 } : undefined);
      break;
    case "migrate:status":
      for (const m of await migrator.executed()) log(`applied  ${m.name}`);
      for (const m of await migrator.pending()) log(`pending  ${m.name}`);
      break;
    case "seed":
      await seedDemo(log);
      if (await isCatalogueEmpty()) await seedDemoCatalogue(log);
      await seedDemoLists(log);
      break;
    case "seed:if-empty":
      if (await isDatabaseEmpty()) await seedDemo(log);
      else log("accounts already present; demo accounts skipped");
      if (await isCatalogueEmpty()) {
        await seedDemoCatalogue(log);
        await seedDemoLists(log);
      } else log("catalogue already has parts; demo catalogue skipped");
      break;
    case "seed:large": {
      const at = flags.indexOf("--parts");
      const parts = at >= 0 ? Number(flags[at + 1]) : 250_000;
      if (!Number.isInteger(parts) || parts < 1 || parts > 5_000_000)
        throw new Error("--parts takes a whole number from 1 to 5000000.");
      await seedLargeCatalogue(parts, log);
      break;
    }
    case "digest": {
      const result = await sendProposalDigest();
      log(
        result.proposals === 0
          ? "no new proposals; nothing sent"
          : `${result.proposals} new proposals; summary sent to ${result.sent} of ${result.recipients} reviewers`,
      );
      if (result.recipients > 0 && result.sent === 0) process.exitCode = 1;
      break;
    }
    case "sweep-photos":
      log(`${await sweepAbandonedPhotos()} abandoned photos deleted`);
      break;
    default:
      console.error(usage);
      process.exitCode = 2;
  }
}

main(process.argv[2], process.argv.slice(3))
  .catch((error) => {
    console.error(`[db] ${error instanceof Error ? error.message : String(error)}`);
    process.exitCode = 1;
  })
  .finally(() => sequelize.close());
