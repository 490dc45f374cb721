import { NextRequest } from "next/server";
import { describe, expect, it } from "vitest";
import { proxy } from "@/proxy";

function request(method: string, headers: Record<string, string>) {
  return new NextRequest("http://shop.example:3000/api/auth/sign-out", {
    method,
    headers: { host: "shop.example:3000", ...headers },
  });
}

describe("the CSRF origin check", () => {
  it("lets a POST from the site's own pages through", () => {
    const response = proxy(request("POST", { origin: "http://shop.example:3000" }));
    expect(response.status).toBe(200);
  });

  it("refuses a POST from a foreign origin", async () => {
    const response = proxy(request("POST", { origin: "http://elsewhere.example" }));
    expect(response.status).toBe(403);
    expect(await response.json()).toMatchObject({ error: "forbidden_origin" });
  });

  it("refuses a POST from the same host under another scheme", () => {
    expect(proxy(request("POST", { origin: "https://shop.example:3000" })).status).toBe(403);
    expect(proxy(request("POST", { referer: "https://shop.example:3000/account" })).status).toBe(403);
  });

  it("refuses a POST with neither Origin nor Referer", () => {
    expect(proxy(request("DELETE", {})).status).toBe(403);
  });

  it("falls back to the Referer when a browser sends no Origin", () => {
    expect(proxy(request("PATCH", { referer: "http://shop.example:3000/account" })).status).toBe(200);
    expect(proxy(request("PATCH", { referer: "http://elsewhere.example/page" })).status).toBe(403);
  });

  it("does not stand in the way of reading", () => {
    expect(proxy(request("GET", { origin: "http://elsewhere.example" })).status).toBe(200);
  });
});

describe("addresses that cannot be decoded", () => {
  it("refuses a broken % escape in the path with 400 and the reason", async () => {
    const response = proxy(
      new NextRequest("http://shop.example:3000/api/parts/%FF", { headers: { host: "shop.example:3000" } }),
    );
    expect(response.status).toBe(400);
    expect(await response.json()).toMatchObject({ error: "validation_failed", field: "path" });
  });

  it("lets a well-formed escape through", () => {
    expect(
      proxy(new NextRequest("http://shop.example:3000/lookup/%C3%97", { headers: { host: "shop.example:3000" } }))
        .status,
    ).toBe(200);
  });
});
