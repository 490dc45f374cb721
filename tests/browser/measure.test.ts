import { describe, expect, it } from "vitest";
import { APP_URL } from "../helpers/api";
import { pagePerTest } from "../helpers/browser";

// A phone in the workshop: the pages must work at this size.
const currentPage = pagePerTest({ width: 390, height: 844 });

const field = (label: string) => currentPage().getByLabel(label, { exact: true });
const firstRow = () => currentPage().locator("tbody tr").first().locator("th");

describe("measuring a part", () => {
  it("reads a bearing number and matches a measured bearing", async () => {
    const page = currentPage();
    await page.goto(`${APP_URL}/`);
    await page.getByRole("link", { name: "Measure a part" }).first().click();
    await field("Bearing number as stamped on its side").fill("6305-2Z");
    await page.getByTestId("bearing-decoded").getByText("62 mm").waitFor();

    await field("Bore (d)").fill("25.03");
    await field("Outside diameter (D)").fill("61.97");
    await field("Width (B)").fill("17");
    await firstRow().getByText("6305").waitFor();
  });

  it("matches an inch lip seal, explains the groove and checks the press fit", async () => {
    const page = currentPage();
    await page.goto(`${APP_URL}/measure/seal`);
    await page.getByText("inch", { exact: true }).click();
    await field("Shaft").fill("1-1/4");
    await field("Housing bore").fill("2");
    await field("Width").fill("3/8");
    await firstRow().getByText("1-1/4 × 2 × 3/8 in").waitFor();

    await page.getByLabel("The old lip has worn a groove in the shaft").check();
    await page.getByText("What to do about the groove").waitFor();

    await field("Seal outside diameter").fill("2.004");
    await page.getByText("Fit OK.").waitFor();
  });

  it("reads a belt number, names the section and works out a drive", async () => {
    const page = currentPage();
    await page.goto(`${APP_URL}/measure/belt`);
    await field("Belt number").fill("B60");
    await page.getByTestId("belt-decoded").getByText(/^61\.8 in$/).waitFor();

    await field("Top width").fill("21/32");
    await field("Thickness").fill("13/32");
    await firstRow().getByText("B", { exact: true }).waitFor();

    await field("Large pulley, pitch diameter").fill("10");
    await field("Small pulley, pitch diameter").fill("5");
    await field("Centre distance").fill("24");
    await page.getByTestId("drive-result").getByText(/^71\.823 in$/).waitFor();
  });

  it("shows the reason under the field when a size cannot be read", async () => {
    const page = currentPage();
    await page.goto(`${APP_URL}/measure/bearing`);
    await field("Bore (d)").fill("about an inch");
    await field("Outside diameter (D)").fill("52");
    await page.locator("#bore-error").getByText("is not a size").waitFor();
    expect(await field("Bore (d)").getAttribute("aria-invalid")).toBe("true");
  });
});
