import { describe, expect, it } from "vitest";
import { APP_URL, DEMO_PASSWORD, uniqueEmail } from "../helpers/api";
import { pagePerTest } from "../helpers/browser";

// A phone in the workshop: the pages must work at this size.
const currentPage = pagePerTest({ width: 390, height: 844 });

describe("signing in and out", () => {
  it("signs the demo member in through the form, shows the user menu, and signs out", async () => {
    const page = currentPage();
    await page.goto(`${APP_URL}/`);
    // On a phone the header is one row: sign-in sits behind the menu button with the areas.
    await page.getByLabel("Menu: the areas of Understudy").click();
    await page.getByTestId("area-menu").getByRole("link", { name: "Sign in" }).click();
    await page.getByLabel("E-mail").fill("member@understudy.test");
    await page.getByLabel("Password").fill(DEMO_PASSWORD);
    await page.getByRole("button", { name: "Sign in" }).click();

    const menu = page.getByTestId("user-menu");
    await menu.waitFor();
    await menu.locator("summary").click();
    expect(await menu.textContent()).toContain("member@understudy.test");
    expect(await menu.textContent()).toContain("Member");

    await menu.getByRole("button", { name: "Sign out" }).click();
    await page.getByText("You are signed out.").waitFor();
    expect(await page.getByTestId("user-menu").count()).toBe(0);
    await page.getByLabel("Menu: the areas of Understudy").click();
    expect(await page.getByTestId("area-menu").getByRole("link", { name: "Sign in" }).count()).toBe(1);
  });

  it("shows the reason beside the field when the e-mail is malformed, without sending anything", async () => {
    const page = currentPage();
    await page.goto(`${APP_URL}/sign-in`);
    await page.getByLabel("E-mail").fill("member-at-understudy");
    await page.getByLabel("Password").fill("whatever");
    await page.getByRole("button", { name: "Sign in" }).click();
    const email = page.getByLabel("E-mail");
    await page.locator("#email-error").waitFor();
    expect(await email.getAttribute("aria-invalid")).toBe("true");
    expect(await email.getAttribute("aria-describedby")).toContain("email-error");
  });

  it("says plainly when the password is wrong", async () => {
    const page = currentPage();
    await page.goto(`${APP_URL}/sign-in`);
    await page.getByLabel("E-mail").fill("moderator@understudy.test");
    await page.getByLabel("Password").fill("not-the-demo-password");
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.getByRole("alert").getByText("do not match an account").waitFor();
  });
});

describe("opening an account", () => {
  it("signs up, follows the confirmation link from the captured mail, and signs in", async () => {
    const page = currentPage();
    const email = uniqueEmail("browser");
    const password = "crank-pin-journal-2";
    await page.goto(`${APP_URL}/sign-up`);
    await page.getByLabel("E-mail").fill(email);
    await page.getByLabel("Password").fill(password);
    await page.getByRole("button", { name: "Open my account" }).click();
    await page.getByText(`We sent a confirmation link to ${email}`).waitFor();

    await page.goto(`${APP_URL}/dev/mail`);
    await page
      .getByRole("link", { name: new RegExp(`Confirm your e-mail.*${email}`) })
      .first()
      .click();
    await page.getByRole("link", { name: /\/verify-email\?token=/ }).click();
    await page.getByText("is confirmed").waitFor();

    await page.getByRole("main").getByRole("link", { name: "Sign in now" }).click();
    await page.getByLabel("E-mail").fill(email);
    await page.getByLabel("Password").fill(password);
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.getByTestId("user-menu").waitFor();
  });
});

describe("after signing in", () => {
  for (const next of ["/%5Cevil.example/", "/%09/evil.example/", "//evil.example/", "https://evil.example/"]) {
    it(`stays on this site for next=${next}`, async () => {
      const page = currentPage();
      await page.goto(`${APP_URL}/sign-in?next=${next}`);
      await page.getByLabel("E-mail").fill("member@understudy.test");
      await page.getByLabel("Password").fill(DEMO_PASSWORD);
      await page.getByRole("button", { name: "Sign in" }).click();
      await page.getByTestId("user-menu").waitFor();
      expect(new URL(page.url()).origin).toBe(new URL(APP_URL).origin);
    });
  }

  it("follows a path on this site", async () => {
    const page = currentPage();
    await page.goto(`${APP_URL}/sign-in?next=${encodeURIComponent("/lists?from=sign-in")}`);
    await page.getByLabel("E-mail").fill("member@understudy.test");
    await page.getByLabel("Password").fill(DEMO_PASSWORD);
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL(/\/lists\?from=sign-in$/);
  });
});
