import { chromium, type Browser, type BrowserContext, type Page } from "playwright-core";
import { afterAll, afterEach, beforeAll, beforeEach } from "vitest";
import { CHROMIUM_PATH } from "./chromium";

/**
 * Debian's Chromium, headless, in a fresh throw-away profile (playwright makes one per launch), with the flags that
 * keep it off the network it cannot reach here.
 */
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

/**
 * One browser for a test file and a fresh page (own cookies) for each test, at the given screen size.
 * Call at the top of a file; the returned function gives the current test's page. The service worker is blocked
 * unless asked for: each fresh context would install it and fetch every file of the build, and only the offline
 * tests are about it (with a connection it passes every request through).
 */
export function pagePerTest(
  viewport = { width: 390, height: 844 },
  options: { serviceWorkers?: "allow" | "block" } = {},
): () => Page {
  let browser: Browser | undefined;
  let context: BrowserContext | undefined;
  let page: Page | undefined;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });
  beforeEach(async () => {
    if (!browser) throw new Error("The browser did not start");
    context = await browser.newContext({ viewport, serviceWorkers: options.serviceWorkers ?? "block" });
    page = await context.newPage();
  });
  // One open window at a time: a finished test's window left open can starve the next one of animation frames,
  // which playwright waits on before it clicks.
  afterEach(async () => {
    await context?.close();
    context = undefined;
    page = undefined;
  });
  return () => {
    if (!page) throw new Error("No page: pagePerTest() hooks have not run");
    return page;
  };
}

/** Signs in through the sign-in page, as a person would, and waits to be sent on. */
export async function signInAs(page: Page, email: string, password = "understudy-demo"): Promise<void> {
  const base = process.env.APP_URL ?? "http://127.0.0.1:3100";
  await page.goto(`${base}/sign-in`);
  await page.getByLabel("E-mail", { exact: true }).fill(email);
  await page.getByLabel("Password", { exact: true }).fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL((url) => !url.pathname.startsWith("/sign-in"));
}
