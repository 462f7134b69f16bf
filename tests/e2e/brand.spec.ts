import { expect, test } from "@playwright/test";
import AxeBuilder from "@axe-core/playwright";
import { apiClient } from "./pages/api-client";
import { SignInPage } from "./pages/sign-in-page";

test("the header shows the mark, named Chillwright, as the way back to the cases, and passes axe", async ({
  page,
}) => {
  await new SignInPage(page).signInAs("technician");
  const banner = page.getByRole("banner");
  const mark = banner.getByRole("img", { name: "Chillwright" });
  await expect(mark).toBeVisible();
  const box = await mark.boundingBox();
  expect(box?.width).toBeGreaterThanOrEqual(24);
  expect(box?.width).toBeLessThanOrEqual(40);
  await expect(banner.getByRole("link", { name: "Chillwright", exact: true })).toHaveAttribute(
    "href",
    "/cases",
  );
  const results = await new AxeBuilder({ page })
    .include("header")
    .withTags(["wcag2a", "wcag2aa", "wcag21a", "wcag21aa"])
    .analyze();
  expect(results.violations.map((v) => `${v.id} (${v.nodes.length})`)).toEqual([]);
});

test("without a session: the manifest and every icon it or the page names answer 200 with an image", async ({
  page,
}) => {
  const anonymous = await apiClient();
  // No redirects followed: a redirect to the sign-in page would end in a 200 as well.
  const get = (url: string) => anonymous.get(url, { maxRedirects: 0 });

  const manifestResponse = await get("/manifest.webmanifest");
  expect(manifestResponse.status()).toBe(200);
  expect(manifestResponse.headers()["content-type"]).toContain("application/manifest+json");
  const manifest = await manifestResponse.json();
  expect(manifest).toMatchObject({ name: "Chillwright", display: "standalone" });
  const icons: { src: string; sizes: string; purpose?: string }[] = manifest.icons;
  expect(icons.map((i) => `${i.sizes} ${i.purpose ?? "any"}`)).toEqual(
    expect.arrayContaining(["192x192 any", "512x512 any", "192x192 maskable", "512x512 maskable"]),
  );

  await page.goto("/sign-in");
  const linked = await page
    .locator('head link[rel~="icon"], head link[rel="apple-touch-icon"], head link[rel="manifest"]')
    .evaluateAll((links) => links.map((l) => `${l.getAttribute("rel")} ${l.getAttribute("href")}`));
  expect(linked.some((l) => l.startsWith("manifest /manifest.webmanifest"))).toBe(true);
  expect(linked.some((l) => l.startsWith("icon /icon.svg"))).toBe(true);
  expect(linked.some((l) => l.startsWith("apple-touch-icon /apple-icon.png"))).toBe(true);

  const urls = [
    ...icons.map((i) => i.src),
    ...linked.filter((l) => !l.startsWith("manifest")).map((l) => l.split(" ")[1]!),
    "/favicon.ico",
  ];
  for (const url of urls) {
    const response = await get(url);
    expect(response.status(), url).toBe(200);
    expect(response.headers()["content-type"], url).toMatch(/^image\//);
    expect((await response.body()).length, url).toBeGreaterThan(100);
  }
  await anonymous.dispose();
});
