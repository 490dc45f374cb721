import { existsSync } from "node:fs";
import { aptInstall } from "../../docker-free-minio-fake/apt";

/** Debian's Chromium; a browser is never downloaded by the tests themselves. */
export const CHROMIUM_PATH = process.env.CHROMIUM_PATH ?? "/usr/bin/chromium";

export function ensureChromium(log: (message: string) => void): void {
  if (existsSync(CHROMIUM_PATH)) return;
  aptInstall(["chromium"], "The browser tests need Chromium, which is not installed.", log);
}
