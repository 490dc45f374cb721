import { chromium, type Browser } from "playwright-core";
import { CHROMIUM_PATH } from "./chromium";

/** Debian's Chromium, headless, in a fresh throw-away profile (playwright makes one per launch), with the flags that keep it off the network it cannot reach here. */
export function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: CHROMIUM_PATH,
    headless: true,
    args: [
      "--headless",
      "--no-sandbox",
      "--disable-gpu",
      "--disable-quic",
      "--no-first-run",
      "--disable-background-networking",
      "--disable-component-update",
      "--disable-sync",
    ],
  });
}
