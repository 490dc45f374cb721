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
    await page.getByLabel("Menu: the areas of Understudy").click();
    await page.getByTestId("area-menu").getByRole("link", { name: "Measure a part" }).click();
    await field("Bearing number as stamped on its side").fill("6305-2Z");
    await page.getByTestId("bearing-decoded").getByText("62 mm").waitFor();

    // The calculators open in inches on a first visit; this bearing was measured in millimetres.
    await page.getByText("mm", { exact: true }).click();
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

  it("orders the worn inch fan-hub seal and converts the sizes when the unit changes", async () => {
    // Worked example of common practice (no published source): 1-1/2 in shaft worn to 1.497 in, 2.374 in bore,
    // 1/2 in wide; the inch press-fit table (RMA OS-4) gives a new seal OD of 2.376 to 2.380 in.
    const page = currentPage();
    await page.goto(`${APP_URL}/measure/seal`);
    await page.getByText("inch", { exact: true }).click();
    await field("Shaft").fill("1.497");
    await field("Housing bore").fill("2.374");
    await field("Width").fill("0.5");
    await page.getByTestId("order-label").getByText("1-1/2 × 2.374 × 1/2 in").waitFor();
    await page.getByTestId("order").getByText("2.376 in to 2.380 in", { exact: true }).waitFor();
    expect(await page.getByTestId("order").textContent()).not.toMatch(/memory/i);

    await page.getByText("mm", { exact: true }).click();
    // 1.497 in = 38.0238 mm and 2.374 in = 60.2996 mm (25.4 mm/in), at 0.01 mm.
    await page.waitForFunction(() => (document.querySelector("#shaft") as HTMLInputElement).value === "38.02");
    expect(await field("Housing bore").inputValue()).toBe("60.3");
    expect(await field("Width").inputValue()).toBe("12.7");

    // The choice is remembered: another calculator opens in millimetres.
    await page.goto(`${APP_URL}/measure/bearing`);
    expect(await page.getByRole("radio", { name: "mm" }).isChecked()).toBe(true);
  });

  it("reads a belt number, names the section and works out a drive", async () => {
    const page = currentPage();
    await page.goto(`${APP_URL}/measure/belt`);
    await field("Belt number").fill("B60");
    await page
      .getByTestId("belt-decoded")
      .getByText(/^61\.8 in$/)
      .waitFor();

    await field("Top width").fill("21/32");
    await field("Thickness").fill("13/32");
    await firstRow().getByText("B", { exact: true }).waitFor();

    await field("Large pulley, pitch diameter").fill("10");
    await field("Small pulley, pitch diameter").fill("5");
    await field("Centre distance").fill("24");
    await page
      .getByTestId("drive-result")
      .getByText(/^71\.823 in$/)
      .waitFor();
  });

  it("shows the reason under the field when a size cannot be read", async () => {
    const page = currentPage();
    await page.goto(`${APP_URL}/measure/bearing`);
    await field("Bore (d)").fill("about an inch");
    await field("Outside diameter (D)").fill("52");
    await page.locator("#bore-error").getByText("is not a size").waitFor();
    expect(await field("Bore (d)").getAttribute("aria-invalid")).toBe("true");
  });

  it("sizes a felt, gland packing and a cup plug from the workshop tabs", async () => {
    const page = currentPage();
    await page.goto(`${APP_URL}/measure/felt`);
    await page.getByText("inch", { exact: true }).click();
    await field("Shaft").fill("1.247");
    await field("Groove bore").fill("1.75");
    await field("Groove width").fill("1/4");
    await page.getByTestId("order-label").getByText("Felt ring 1-1/4 × 1-3/4 × 1/4 in").waitFor();

    await page.getByRole("link", { name: "Packing", exact: true }).click();
    await page.waitForURL(/\/measure\/packing$/);
    await field("Box bore").waitFor();
    await field("Shaft").fill("5/8");
    await field("Box bore").fill("1-1/8");
    await field("Box depth").fill("1");
    await page.getByTestId("order-label").getByText("Gland packing 1/4 in square").waitFor();
    await page.getByText("Packing glands on a running pump").waitFor();

    await page.getByRole("link", { name: "Plug", exact: true }).click();
    await page.waitForURL(/\/measure\/plug$/);
    await page.getByText("Kind of plug").waitFor();
    await field("Bore").fill("1.503");
    await page.getByTestId("order-label").getByText("Cup plug 1-1/2 in").waitFor();
    await page.getByText("differ by only 0.1 mm").waitFor();
    await page.getByText("Drivers, punches and hammers").waitFor();
  });

  it("identifies a thread, a Woodruff key, a taper pin and a chain from the small-parts tabs", async () => {
    const page = currentPage();
    await page.goto(`${APP_URL}/measure/thread`);
    await page.getByText("inch", { exact: true }).click();
    await field("Diameter over the crests").fill("0.247");
    await field("Threads per inch").fill("28");
    await page.getByTestId("order-label").getByText("1/4-28 UNF").waitFor();
    await page.getByText("look alike").first().waitFor();
    await page.getByText("Grease guns").waitFor();

    await page.getByRole("link", { name: "Key", exact: true }).click();
    await page.waitForURL(/\/measure\/key$/);
    await field("Key number").fill("606");
    await page.getByTestId("order-label").getByText("Woodruff key No. 606 (3/16 × 3/4 in)").first().waitFor();

    await page.getByRole("link", { name: "Pin", exact: true }).click();
    await page.waitForURL(/\/measure\/pin$/);
    await field("Large end").fill("0.249");
    await page.getByTestId("order-label").getByText("Taper pin No. 4").waitFor();

    await page.getByRole("link", { name: "Chain", exact: true }).click();
    await page.waitForURL(/\/measure\/chain$/);
    await field("Chain number").fill("40");
    await field("Small sprocket's teeth").fill("15");
    await field("Large sprocket's teeth").fill("30");
    await field("Centre distance").fill("20");
    await page.getByTestId("order-label").getByText("104 links").waitFor();
    await page.getByText("Chains and sprockets").waitFor();
  });
});
