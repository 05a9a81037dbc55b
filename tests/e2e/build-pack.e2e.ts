import { execFileSync } from "node:child_process";
import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { demoAccount, login, queryDb, screenshot, SCREENSHOT_DIR, url, useBrowser } from "./fixtures";

const browser = useBrowser();

async function summerId(): Promise<string> {
  const [row] = await queryDb<{ id: string }>("select id from layouts where name = ?", ["Summer layout"]);
  return row.id;
}

/** Page 1 of a PDF as a PNG beside the screenshots (Debian's pdftoppm), kept as an artefact. */
function pdfFirstPage(bytes: Buffer, name: string): string {
  fs.mkdirSync(SCREENSHOT_DIR, { recursive: true });
  const pdf = path.join(SCREENSHOT_DIR, `${name}.pdf`);
  fs.writeFileSync(pdf, bytes);
  execFileSync("pdftoppm", ["-png", "-r", "80", "-f", "1", "-l", "1", "-singlefile", pdf, pdf.slice(0, -4)]);
  return `${pdf.slice(0, -4)}.png`;
}

describe("build pack in the browser", () => {
  it("takes a director from the layout page to both sheets, reproducible from the address, printable, downloadable", async () => {
    const page = await browser.newPage();
    await login(page, demoAccount("director"));
    const id = await summerId();
    await page.goto(url(`/layouts/${id}`));
    await page.getByRole("link", { name: "Open the build pack" }).click();
    await page.getByRole("heading", { level: 1, name: "Build pack: Summer layout" }).waitFor();
    const main = page.getByRole("main");
    expect(await main.getByRole("heading", { name: "Marking-out sheet" }).count()).toBe(1);
    expect(await main.getByRole("heading", { name: "Earthworks sheet" }).count()).toBe(1);
    expect(await main.getByRole("heading", { name: "Building safely" }).count()).toBe(1);
    expect(
      await main.getByRole("img", { name: /plan drawn to scale with datum stakes A and B/ }).count(),
    ).toBe(1);
    expect(await main.getByText("Datum A: Driver stand at plan x 30.000 m, y -3.000 m.").count()).toBe(1);
    expect(await main.getByRole("rowheader", { name: "J1-LIP" }).count()).toBe(1);
    await screenshot(page, "build-pack-01-sheets");

    // New settings through the GET form: they land in the address.
    await page.getByLabel("Datum B stake").selectOption("corner-4");
    await page.getByLabel("Station spacing (m)").fill("10");
    await page.getByLabel("Latitude of datum A (°)").fill("52.1");
    await page.getByLabel("Longitude of datum A (°)").fill("-1.2");
    await page.getByLabel("True bearing (°)").fill("15");
    await page.getByRole("button", { name: "Make the sheets" }).click();
    await page.waitForURL(/spacing=10/);
    expect(page.url()).toMatch(/b=corner-4/);
    await page.getByRole("table", { name: /a station every 10 m/ }).waitFor();
    expect(await main.getByRole("columnheader", { name: "Latitude (°)" }).count()).toBe(2);
    // The form and the head of the sheet only: a full page of this length takes seconds to encode.
    await page.screenshot({ path: path.join(SCREENSHOT_DIR, "build-pack-02-settings.png") });

    // The printed sheet leaves out the site header and the form, keeps the cautions.
    await page.emulateMedia({ media: "print" });
    expect(await page.getByRole("button", { name: "Make the sheets" }).isVisible()).toBe(false);
    expect(await main.getByRole("heading", { name: "Building safely" }).isVisible()).toBe(true);
    await screenshot(page, "build-pack-03-print");
    await page.emulateMedia({ media: "screen" });

    // The download links carry the same settings.
    const href = await page.getByRole("link", { name: "Marking-out sheet (PDF)" }).getAttribute("href");
    expect(href).toMatch(/marking\.pdf\?.*spacing=10.*lat=52\.1/);
    for (const [link, type, name] of [
      ["Marking-out sheet (PDF)", "application/pdf", "build-pack-04-marking-pdf"],
      ["Earthworks sheet (PDF)", "application/pdf", "build-pack-05-earthworks-pdf"],
      ["Stake points (CSV)", "text/csv", ""],
    ]) {
      const target = await page.getByRole("link", { name: link }).getAttribute("href");
      const res = await page.request.get(url(target!));
      expect(res.status(), link).toBe(200);
      expect(res.headers()["content-type"], link).toContain(type);
      if (name) expect(fs.existsSync(pdfFirstPage(await res.body(), name))).toBe(true);
      else
        expect((await res.text()).split("\r\n")[0]).toMatch(
          /^point,easting_m,northing_m,height_m,description/,
        );
    }
  });

  it("names a wrong setting beside its field and keeps the build pack from drivers", async () => {
    const page = await browser.newPage();
    await login(page, demoAccount("director"));
    const id = await summerId();
    const res = await page.goto(url(`/layouts/${id}/build?spacing=0.1`));
    expect(res?.status()).toBe(400);
    const spacing = page.getByLabel("Station spacing (m)");
    expect(await spacing.getAttribute("aria-invalid")).toBe("true");
    expect(await page.getByText("The station spacing must be at least 0.5 m.").count()).toBe(1);
    expect(await page.getByRole("heading", { name: "Marking-out sheet" }).count()).toBe(0);
    await page.goto(url(`/layouts/${id}/build?colour=red`));
    expect(await page.getByText("colour: is not a setting of the build pack.").count()).toBe(1);

    const driverPage = await browser.newPage();
    await login(driverPage, demoAccount("driver"));
    await driverPage.goto(url(`/layouts/${id}`));
    await driverPage.getByRole("heading", { level: 1, name: "Summer layout" }).waitFor();
    expect(await driverPage.getByRole("link", { name: "Open the build pack" }).count()).toBe(0);
    const refused = await driverPage.goto(url(`/layouts/${id}/build`));
    expect(refused?.status()).toBe(403);
  });
});
