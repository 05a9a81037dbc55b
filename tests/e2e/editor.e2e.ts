/**
 * The layout editor in headless Chromium: build a layout from one straight, drag a handle, close
 * the loop, save, reload and find it unchanged; upload and calibrate a site photo; the verdict
 * markers; a conflict between two directors; the read-only plan; frame times of a drag on a
 * 60-section layout (printed). Screenshots go to test-results/screenshots/.
 */
import { randomUUID } from "node:crypto";
import zlib from "node:zlib";
import type { Page } from "playwright-core";
import { describe, expect, it } from "vitest";
import { type LayoutDocument, starterDocument } from "~/analysis";
import { DEMO_CLUB, demoAccount, login, queryDb, screenshot, url, useBrowser } from "./fixtures";

const browser = useBrowser();

/** Creates a draft layout of the demo club holding `doc` as version 1; returns its id. */
async function createLayout(name: string, doc?: LayoutDocument): Promise<string> {
  const [club] = await queryDb<{ id: string }>("select id from clubs where name = ?", [DEMO_CLUB]);
  const [user] = await queryDb<{ id: string }>("select id from users where email = ?", [
    demoAccount("director").email,
  ]);
  const id = randomUUID();
  await queryDb(
    "insert into layouts (id, club_id, name, surface, track_width, status, version, created_by) values (?, ?, ?, 'dirt', 3, 'draft', 1, ?)",
    [id, club.id, name, user.id],
  );
  if (doc)
    await queryDb(
      "insert into layout_versions (id, layout_id, number, document, created_by) values (?, ?, 1, ?, ?)",
      [randomUUID(), id, JSON.stringify({ ...doc, name }), user.id],
    );
  return id;
}

async function storedDocument(layoutId: string): Promise<LayoutDocument> {
  const [row] = await queryDb<{ document: string }>(
    "select document from layout_versions where layout_id = ? order by number desc limit 1",
    [layoutId],
  );
  return JSON.parse(row.document);
}

/** Opens the editor and waits until the konva stage is drawn. */
async function openEditor(page: Page, layoutId: string) {
  await page.goto(url(`/layouts/${layoutId}/edit`));
  await page.waitForFunction(
    () => (window as unknown as { Konva?: { stages: unknown[] } }).Konva?.stages.length === 1,
  );
}

/** Page coordinates of the first konva node with the given name (e.g. "handle-end"). */
async function nodePosition(page: Page, name: string): Promise<{ x: number; y: number }> {
  return page.evaluate((n) => {
    type Node = { getAbsolutePosition(): { x: number; y: number } };
    const stage = (
      window as unknown as {
        Konva: { stages: { findOne(s: string): Node | undefined; container(): HTMLElement }[] };
      }
    ).Konva.stages[0];
    const node = stage.findOne(`.${n}`);
    if (!node) throw new Error(`no konva node named ${n}`);
    const p = node.getAbsolutePosition();
    const r = stage.container().getBoundingClientRect();
    return { x: r.left + p.x, y: r.top + p.y };
  }, name);
}

async function konvaCount(page: Page, pattern: string): Promise<number> {
  return page.evaluate((src) => {
    const re = new RegExp(src);
    const stage = (
      window as unknown as { Konva: { stages: { find(f: (n: { name(): string }) => boolean): unknown[] }[] } }
    ).Konva.stages[0];
    return stage.find((n) => re.test(n.name())).length;
  }, pattern);
}

async function drag(page: Page, from: { x: number; y: number }, to: { x: number; y: number }, steps = 12) {
  await page.mouse.move(from.x, from.y);
  await page.mouse.down();
  await page.mouse.move(to.x, to.y, { steps });
  await page.mouse.up();
}

const sectionList = (page: Page) =>
  page.getByRole("list", { name: "Sections in lap order" }).getByRole("button");

async function typeField(page: Page, label: string, value: string) {
  const field = page.getByLabel(label, { exact: false }).first();
  await field.fill(value);
  await field.blur();
}

describe("layout editor", () => {
  it("builds a layout from one straight, drags a handle, closes the loop, saves and finds it unchanged after a reload", async () => {
    const id = await createLayout(`Built in the browser ${Date.now()}`);
    const page = await browser.newPage();
    await login(page, demoAccount("director"));
    await openEditor(page, id);
    // from the starter oval, delete back to its first straight (the last section each time)
    await sectionList(page).last().click();
    for (let k = 0; k < 3; k++) await page.keyboard.press("Delete");
    expect(await sectionList(page).count()).toBe(1);
    await page.keyboard.press("Delete");
    await page.getByText("A layout keeps at least one section.").waitFor();

    // straight 30 m (kept), left hairpin 180 deg R 8, straight 30 m, left hairpin 180 deg R 8
    await page.getByRole("button", { name: "Left turn", exact: true }).click();
    await typeField(page, "Angle (deg)", "180");
    await typeField(page, "Radius (m)", "8");
    await page.getByRole("button", { name: "Straight", exact: true }).click();
    await typeField(page, "Length (m)", "30");
    await page.getByRole("button", { name: "Left turn", exact: true }).click();
    await typeField(page, "Angle (deg)", "180");
    await typeField(page, "Radius (m)", "8");
    expect(await sectionList(page).allTextContents()).toEqual([
      "1. Straight 30.0 m",
      "2. Left hairpin 180° R 8.0 m",
      "3. Straight 30.0 m",
      "4. Left hairpin 180° R 8.0 m",
    ]);
    await page.getByTestId("closure").getByText("Loop closed").waitFor();

    // drag the back straight's end handle about 4 m shorter: the loop opens
    await sectionList(page).nth(2).click();
    const end = await nodePosition(page, "handle-end");
    const scale = await page.evaluate(() => {
      const stage = (
        window as unknown as {
          Konva: { stages: { getLayers(): { getChildren(): { scaleX(): number }[] }[] }[] };
        }
      ).Konva.stages[0];
      return stage.getLayers()[2].getChildren()[0].scaleX(); // 0 backdrop, 1 marshal zones, 2 track
    });
    // the back straight runs towards -X on screen (heading 180 deg)
    await drag(page, end, { x: end.x + 4 * scale, y: end.y + 10 });
    const dragged = (await sectionList(page).nth(2).textContent()) ?? "";
    const length = Number(/Straight ([\d.]+) m/.exec(dragged)![1]);
    expect(length).toBeGreaterThan(25);
    expect(length).toBeLessThan(27.5);
    expect(length * 10).toBeCloseTo(Math.round(length * 10), 6); // snapped to 0.1 m
    await page.getByTestId("closure").getByText("Loop open").waitFor();
    await screenshot(page, "20-editor-loop-open");
    // the whole drag is one undo step; redo brings it back
    await page.keyboard.press("Control+z");
    await expect.poll(() => sectionList(page).nth(2).textContent()).toBe("3. Straight 30.0 m");
    await page.keyboard.press("Control+Shift+z");
    await expect.poll(() => sectionList(page).nth(2).textContent()).toBe(dragged);

    // closing the loop first shows the change: a dashed centre line and the list; then applies it
    await page.getByRole("button", { name: "Close the loop…" }).click();
    const proposal = page.getByTestId("close-loop-proposal");
    await proposal.waitFor();
    expect(await konvaCount(page, "^close-loop-ghost$")).toBe(1);
    expect(await proposal.getByRole("list", { name: "Proposed changes" }).getByRole("listitem").count()).toBe(
      1,
    );
    expect(await sectionList(page).nth(2).textContent()).toBe(dragged); // nothing changed yet
    await proposal.getByRole("button", { name: "Apply the change" }).click();
    await page.getByTestId("closure").getByText("Loop closed").waitFor();
    expect(await konvaCount(page, "^close-loop-ghost$")).toBe(0);
    // with snapping on, the new length is on the 0.1 m grid
    const closedLength = Number(
      /Straight ([\d.]+) m/.exec((await sectionList(page).nth(0).textContent()) ?? "")?.[1] ?? NaN,
    );
    const backLength = Number(
      /Straight ([\d.]+) m/.exec((await sectionList(page).nth(2).textContent()) ?? "")?.[1] ?? NaN,
    );
    expect([closedLength, backLength].every((l) => Math.abs(l * 10 - Math.round(l * 10)) < 1e-6)).toBe(true);
    // leaving with unsaved changes asks first
    await page.getByRole("link", { name: "Layout page" }).click();
    const leave = page.getByRole("alertdialog", { name: "Leave without saving?" });
    await leave.waitFor();
    await leave.getByRole("button", { name: "Stay and keep editing" }).click();
    expect(new URL(page.url()).pathname).toBe(`/layouts/${id}/edit`);
    await page.getByRole("button", { name: "Save", exact: true }).click();
    await expect
      .poll(() => page.getByTestId("save-status").textContent())
      .toMatch(/Version 2, no unsaved changes|Saved as version 2/);
    const before = await sectionList(page).allTextContents();
    await screenshot(page, "21-editor-loop-closed-saved");

    await page.reload();
    await page.waitForFunction(
      () => (window as unknown as { Konva?: { stages: unknown[] } }).Konva?.stages.length === 1,
    );
    expect(await sectionList(page).allTextContents()).toEqual(before);
    await page.getByTestId("closure").getByText("Loop closed").waitFor();
    const stored = await storedDocument(id);
    expect(stored.sections.map((s) => s.kind)).toEqual(["straight", "turn", "straight", "turn"]);
  });

  it("uploads a site photo, refuses a text file with a message, calibrates the scale from two points and a distance", async () => {
    const id = await createLayout(`Photo ${Date.now()}`);
    const page = await browser.newPage();
    await login(page, demoAccount("director"));
    await openEditor(page, id);
    await page.locator("summary", { hasText: "Site photo" }).click();
    await page
      .locator("#photo-file")
      .setInputFiles({ name: "notes.txt", mimeType: "text/plain", buffer: Buffer.from("not a photo") });
    await page.getByRole("alert").filter({ hasText: "Only PNG or JPEG files are accepted." }).waitFor();
    await page
      .locator("#photo-file")
      .setInputFiles({ name: "site.png", mimeType: "image/png", buffer: makePng(240, 160) });
    await page.getByTestId("photo-scale").waitFor();
    await expect.poll(() => konvaCount(page, "^site-photo$")).toBe(1);

    const before = await photoState(page);
    const box = (await page.getByTestId("plan-canvas").boundingBox())!;
    const a = { x: box.x + box.width / 2 - 150, y: box.y + box.height / 2 };
    const b = { x: a.x + 300, y: a.y };
    await page.getByRole("button", { name: "Calibrate the scale" }).click();
    await page.mouse.click(a.x, a.y);
    await page.mouse.click(b.x, b.y);
    await page.getByLabel("Distance between the points (m)").fill("25");
    await page.getByRole("button", { name: "Set the scale" }).click();
    const after = await photoState(page);
    // 300 screen px are 300 / viewScale metres, i.e. 300 / (viewScale * mpp) photo pixels; they must now span 25 m
    const photoPixels = 300 / (before.viewScale * before.mpp);
    expect(after.mpp).toBeCloseTo(25 / photoPixels, 6);
    await screenshot(page, "22-editor-photo-calibrated");

    await page.getByLabel("Hide the photo").check();
    await expect.poll(() => konvaCount(page, "^site-photo$")).toBe(0);
    await page.getByLabel("Hide the photo").uncheck();
    await page.getByRole("button", { name: "Save", exact: true }).click();
    await expect
      .poll(() => page.getByTestId("save-status").textContent())
      .toMatch(/Saved as version 2|Version 2/);
    const stored = await storedDocument(id);
    expect(stored.background?.metresPerPixel).toBeCloseTo(after.mpp, 6);
    const photo = await page.request.get(url(`/files/${stored.background!.fileId}`));
    expect(photo.status()).toBe(200);
    expect(photo.headers()["content-type"]).toBe("image/png");
  });

  it("marks each jump with its verdict once the analysis answers", async () => {
    const page = await browser.newPage();
    await login(page, demoAccount("director"));
    const probe = await page.request.post(url("/api/analysis"), {
      data: { document: starterDocument("probe", 3) },
    });
    expect(probe.status()).toBe(200);
    const doc = starterDocument("Verdicts", 3);
    doc.sections.splice(
      1,
      0,
      {
        id: "j1",
        kind: "jump",
        preset: "tabletop",
        faceHeight: 0.5,
        faceAngleDeg: 30,
        tableLength: 3,
        landingAngleDeg: 25,
      },
      { id: "s9", kind: "straight", length: 2 },
    );
    (doc.sections[0] as { length: number }).length = 20;
    const id = await createLayout(`Verdicts ${Date.now()}`, doc);
    await openEditor(page, id);
    await expect
      .poll(() => page.getByTestId("analysis-status").textContent(), { timeout: 20_000 })
      .toMatch(/up to date/);
    const jumps = page.getByRole("list", { name: "Jumps and their verdicts" }).getByRole("button");
    expect(await jumps.count()).toBe(1);
    expect(await jumps.first().textContent()).toMatch(/Set up in the air|Take it straight|Cannot clear/);
    expect(await konvaCount(page, "^verdict verdict-1$")).toBe(1);
    await jumps.first().click();
    expect(await sectionList(page).nth(1).getAttribute("aria-current")).toBe("true");
    await screenshot(page, "23-editor-verdicts");
  });

  it("offers to reload or save a copy when another director saved first, losing nothing", async () => {
    const id = await createLayout(`Two directors ${Date.now()}`);
    const first = await browser.newPage();
    await login(first, demoAccount("director"));
    const second = await browser.newPage();
    await login(second, demoAccount("director"));
    await openEditor(first, id);
    await openEditor(second, id);
    await sectionList(first).first().click();
    await typeField(first, "Length (m)", "32");
    await first.getByRole("button", { name: "Save", exact: true }).click();
    await expect.poll(() => first.getByTestId("save-status").textContent()).toMatch(/version 2/i);

    await sectionList(second).first().click();
    await typeField(second, "Length (m)", "28");
    await second.getByRole("button", { name: "Save", exact: true }).click();
    const dialog = second.getByRole("alertdialog", { name: "Someone else saved this layout" });
    await dialog.waitFor();
    expect(await dialog.textContent()).toMatch(/version 1; it is now at version 2/);
    await screenshot(second, "24-editor-conflict");
    // reloading shows the other director's version; the own drawing is one undo step back
    await dialog.getByRole("button", { name: "Reload the saved version" }).click();
    await expect.poll(() => sectionList(second).first().textContent()).toBe("1. Straight 32.0 m");
    expect(await second.getByTestId("save-status").textContent()).toMatch(/Version 2, no unsaved changes/);
    await second.keyboard.press("Control+z");
    await expect.poll(() => sectionList(second).first().textContent()).toBe("1. Straight 28.0 m");
    await second.getByRole("button", { name: "Save as a copy" }).click();
    // the editor stays and says where the copy is, with a link to it
    const copied = second.getByTestId("copy-status");
    await copied.waitFor();
    expect(await copied.textContent()).toMatch(
      /Saved as a copy: “Two directors .* \(copy\)”, a new draft layout of/,
    );
    await copied.getByRole("link", { name: "Open the copy in the editor" }).click();
    await second.waitForURL((u) => u.pathname.endsWith("/edit") && !u.pathname.includes(id));
    await second.waitForFunction(
      () => (window as unknown as { Konva?: { stages: unknown[] } }).Konva?.stages.length === 1,
    );
    expect(await sectionList(second).first().textContent()).toBe("1. Straight 28.0 m");
    expect((await storedDocument(id)).sections[0]).toMatchObject({ length: 32 });
  });

  it("keeps unsaved changes in the browser and offers them back when the editor opens again", async () => {
    const id = await createLayout(`Kept in the browser ${Date.now()}`);
    const page = await browser.newPage();
    await login(page, demoAccount("director"));
    await openEditor(page, id);
    await sectionList(page).first().click();
    await typeField(page, "Length (m)", "33");
    await page.waitForTimeout(1500); // the copy is written a second after the last change
    page.on("dialog", (d) => void d.accept()); // the browser's "leave this page?" prompt
    await page.goto(url("/clubs"));
    await openEditor(page, id);
    const banner = page.getByRole("alert").filter({ hasText: "were kept in this browser" });
    await banner.waitFor();
    expect(await sectionList(page).first().textContent()).toBe("1. Straight 30.0 m");
    await banner.getByRole("button", { name: "Bring them back" }).click();
    expect(await sectionList(page).first().textContent()).toBe("1. Straight 33.0 m");
    expect(await page.getByTestId("save-status").textContent()).toBe("Unsaved changes");
  });

  it("shows marshals the read-only plan: no editing tools, numbered marshal points, fits a phone", async () => {
    const doc = {
      ...starterDocument("Race day", 3),
      marshalPoints: [
        { x: 15, y: -4 },
        { x: 15, y: 20 },
      ],
      driverStand: { x: 15, y: -8, eyeHeight: 3 },
    };
    const id = await createLayout(`Race day ${Date.now()}`, doc);
    await queryDb("update layouts set status = 'published' where id = ?", [id]);
    await queryDb(
      "insert into published_versions (id, layout_id, version_number, race_date, note) values (?, ?, 1, '2030-06-01', '')",
      [randomUUID(), id],
    );
    const page = await browser.newPage();
    await login(page, demoAccount("marshal"));
    expect((await page.goto(url(`/layouts/${id}/edit`)))?.status()).toBe(403);
    await page.goto(url(`/layouts/${id}/plan`));
    // The reader's plan is the static drawing: both marshal points numbered, no editing at all.
    const plan = page.getByRole("group", { name: /plan drawn to scale/ });
    for (const m of ["M1", "M2"])
      expect(
        await plan
          .locator("text")
          .filter({ hasText: new RegExp(`^${m}$`) })
          .count(),
        m,
      ).toBe(1);
    expect(await page.getByRole("button", { name: "Save" }).count()).toBe(0);
    expect(await page.getByRole("toolbar", { name: "Drawing tools" }).count()).toBe(0);
    expect(await page.getByRole("link", { name: "Edit the layout" }).count()).toBe(0);
    await screenshot(page, "25-plan-read-only-marshal");
    const phone = await browser.newPage({ width: 390, height: 800 });
    await login(phone, demoAccount("marshal"));
    await phone.goto(url(`/layouts/${id}/plan`));
    const drawn = (await phone.getByRole("group", { name: /plan drawn to scale/ }).boundingBox())!;
    expect(drawn.width).toBeGreaterThan(300);
    expect(await phone.evaluate(() => document.documentElement.scrollWidth > window.innerWidth)).toBe(false);
    await screenshot(phone, "26-plan-read-only-phone");
  });

  it("saves with Ctrl+S from a focused field, and refuses to save while a field shows an error, naming it", async () => {
    const id = await createLayout(`Keyboard ${Date.now()}`);
    const page = await browser.newPage();
    await login(page, demoAccount("director"));
    await openEditor(page, id);
    await sectionList(page).first().click();
    const length = page.getByLabel("Length (m)");
    await length.fill("0.2");
    await page.getByRole("alert").filter({ hasText: "Length must be at least 0.5 m." }).waitFor();
    await length.press("Control+s");
    const status = page.getByTestId("save-status");
    await expect
      .poll(() => status.textContent())
      .toMatch(/^Not saved: Length \(section 1\) shows a value that is refused/);
    expect(await page.evaluate(() => document.activeElement?.getAttribute("aria-invalid"))).toBe("true");
    expect(
      (await queryDb<{ n: number }>("select count(*) as n from layout_versions where layout_id = ?", [id]))[0]
        .n,
    ).toBe(0);
    await length.fill("31.5");
    await length.press("Control+s"); // still in the field: the editor saves, the browser's dialog stays shut
    await expect.poll(() => status.textContent()).toMatch(/Saved as version 2|Version 2, no unsaved changes/);
    expect(await length.evaluate((el) => el === document.activeElement)).toBe(true);
    expect((await storedDocument(id)).sections[0]).toMatchObject({ length: 31.5 });
  });

  it("places the canvas labels of the demo layouts so that no two overlap and none leaves the canvas", async () => {
    const page = await browser.newPage();
    await login(page, demoAccount("director"));
    const demo = await queryDb<{ id: string; name: string }>(
      "select l.id, l.name from layouts l join clubs c on c.id = l.club_id where c.name = ? and l.name in ('Summer layout', 'Wet-weather layout')",
      [DEMO_CLUB],
    );
    expect(demo.length).toBe(2);
    for (const layout of demo) {
      await openEditor(page, layout.id);
      await expect
        .poll(() => page.getByTestId("analysis-status").textContent(), { timeout: 30_000 })
        .toMatch(/up to date/);
      await expect.poll(() => konvaCount(page, "^label label-jump$")).toBeGreaterThan(0);
      const labels = await page.evaluate(() => {
        type Rect = { x: number; y: number; width: number; height: number };
        type Node = {
          getClientRect(): Rect;
          getParent(): Node | null;
          getClassName(): string;
          text(): string;
        };
        const stage = (
          window as unknown as {
            Konva: { stages: { find(s: string): Node[]; width(): number; height(): number }[] };
          }
        ).Konva.stages[0];
        const boxes = stage.find("Text").map((t) => {
          const parent = t.getParent();
          const r = (parent?.getClassName() === "Label" ? parent : t).getClientRect();
          return { text: t.text(), ...r };
        });
        return { boxes, width: stage.width(), height: stage.height() };
      });
      expect(labels.boxes.length).toBeGreaterThan(5);
      const { boxes } = labels;
      for (let i = 0; i < boxes.length; i++) {
        const a = boxes[i];
        expect(a.x, a.text).toBeGreaterThanOrEqual(-0.5);
        expect(a.y, a.text).toBeGreaterThanOrEqual(-0.5);
        expect(a.x + a.width, a.text).toBeLessThanOrEqual(labels.width + 0.5);
        expect(a.y + a.height, a.text).toBeLessThanOrEqual(labels.height + 0.5);
        for (let j = i + 1; j < boxes.length; j++) {
          const b = boxes[j];
          const overlap =
            a.x < b.x + b.width - 0.5 &&
            b.x < a.x + a.width - 0.5 &&
            a.y < b.y + b.height - 0.5 &&
            b.y < a.y + a.height - 0.5;
          expect(overlap, `"${a.text}" and "${b.text}" overlap`).toBe(false);
        }
      }
      // J numbers and M numbers are drawn as on the layout page's plan
      expect(boxes.some((b) => /^J1$/.test(b.text))).toBe(true);
      expect(boxes.some((b) => /^M1$/.test(b.text))).toBe(true);
      await screenshot(page, `28-editor-labels-${layout.name.toLowerCase().replace(/\W+/g, "-")}`);
    }
  });

  it("drags smoothly on a 60-section layout (frame times printed)", async () => {
    // one marshal point, so the marshal zones are drawn under the track while it is dragged
    const doc = { ...serpentine(60), marshalPoints: [{ x: -6, y: -6 }] };
    const id = await createLayout(`Sixty sections ${Date.now()}`, doc);
    const page = await browser.newPage();
    await login(page, demoAccount("director"));
    await openEditor(page, id);
    expect(await sectionList(page).count()).toBe(60);
    await page.waitForFunction(
      () =>
        (window as unknown as { Konva: { stages: { find(s: string): unknown[] }[] } }).Konva.stages[0].find(
          ".marshal-zone",
        ).length > 0,
      undefined,
      { timeout: 30_000 },
    );
    await sectionList(page).first().click(); // the first straight: every later section moves with it
    const end = await nodePosition(page, "handle-end");
    // Time each layer's redraw (0 grid and photo, 1 marshal zones, 2 track, 3 analysis and
    // hotspots, 4 handles and markers).
    await page.evaluate(() => {
      type Layer = { drawScene(...a: unknown[]): unknown; getStage(): { getLayers(): unknown[] } };
      const w = window as unknown as { Konva: { Layer: { prototype: Layer } }; draws_: number[][] };
      w.draws_ = [[], [], [], [], []];
      const proto = w.Konva.Layer.prototype;
      const original = proto.drawScene;
      proto.drawScene = function (this: Layer, ...a: unknown[]) {
        const t = performance.now();
        const out = original.apply(this, a);
        w.draws_[this.getStage().getLayers().indexOf(this)]?.push(performance.now() - t);
        return out;
      };
    });
    await page.evaluate(() => {
      const w = window as unknown as { frames_: number[]; stop_: boolean };
      w.frames_ = [];
      w.stop_ = false;
      let last = performance.now();
      const tick = (now: number) => {
        w.frames_.push(now - last);
        last = now;
        if (!w.stop_) requestAnimationFrame(tick);
      };
      requestAnimationFrame(tick);
    });
    const started = Date.now();
    await drag(page, end, { x: end.x + 160, y: end.y }, 60);
    const wall = Date.now() - started;
    const frames = await page.evaluate(() => {
      const w = window as unknown as { frames_: number[]; stop_: boolean };
      w.stop_ = true;
      return w.frames_.slice(1);
    });
    const draws = await page.evaluate(() => (window as unknown as { draws_: number[][] }).draws_);
    const stats = (xs: number[]) => {
      const sorted = [...xs].sort((a, b) => a - b);
      const pick = (q: number) => sorted[Math.min(sorted.length - 1, Math.floor(q * sorted.length))] ?? 0;
      return `median ${pick(0.5).toFixed(1)} ms, 95th percentile ${pick(0.95).toFixed(1)} ms, longest ${(sorted.at(-1) ?? 0).toFixed(1)} ms`;
    };
    console.log(
      `[editor e2e] 60-section drag over ${wall} ms: ${frames.length} frames, frame time ${stats(frames)}`,
    );
    console.log(
      `[editor e2e] track layer redrawn ${draws[2].length} times: ${stats(draws[2])}; handle layer ${draws[4].length} times: ${stats(draws[4])}; grid and photo layer ${draws[0].length} times, marshal zones layer ${draws[1].length} times, analysis layer ${draws[3].length} times`,
    );
    expect(frames.length).toBeGreaterThan(10);
    // only what changed is redrawn: the track and the handles every move; the grid and photo
    // never; the marshal zones at most twice (faded, then hidden or shown); the analysis once or
    // twice (its line fades when the drawing moves on)
    expect(draws[2].length).toBeGreaterThan(5);
    expect(draws[0].length).toBe(0);
    expect(draws[1].length).toBeLessThanOrEqual(2);
    expect(draws[3].length).toBeLessThanOrEqual(2);
    const text = (await sectionList(page).first().textContent()) ?? "";
    expect(Number(/Straight ([\d.]+) m/.exec(text)![1])).toBeGreaterThan(10);
    await screenshot(page, "27-editor-sixty-sections");
  });
});

/** The photo's scale (m per pixel) and the view's zoom (px per m), read from the konva nodes. */
async function photoState(page: Page): Promise<{ mpp: number; viewScale: number }> {
  return page.evaluate(() => {
    type N = { scaleX(): number; getParent(): N; name(): string };
    const stage = (window as unknown as { Konva: { stages: { findOne(s: string): N }[] } }).Konva.stages[0];
    const image = stage.findOne(".site-photo");
    const placement = image.getParent();
    return { mpp: placement.scaleX(), viewScale: placement.getParent().scaleX() };
  });
}

/** A small RGB PNG (a grass-green field with a darker stripe) made from scratch. */
function makePng(width: number, height: number): Buffer {
  const raw = Buffer.alloc((width * 3 + 1) * height);
  for (let y = 0; y < height; y++) {
    raw[y * (width * 3 + 1)] = 0;
    for (let x = 0; x < width; x++) {
      const o = y * (width * 3 + 1) + 1 + x * 3;
      const stripe = Math.abs(x - y) < 8;
      raw[o] = stripe ? 120 : 96;
      raw[o + 1] = stripe ? 96 : 150;
      raw[o + 2] = stripe ? 60 : 80;
    }
  }
  const chunk = (type: string, data: Buffer) => {
    const len = Buffer.alloc(4);
    len.writeUInt32BE(data.length);
    const body = Buffer.concat([Buffer.from(type, "ascii"), data]);
    const crc = Buffer.alloc(4);
    crc.writeUInt32BE(crc32(body));
    return Buffer.concat([len, body, crc]);
  };
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(width, 0);
  ihdr.writeUInt32BE(height, 4);
  ihdr[8] = 8; // bit depth
  ihdr[9] = 2; // colour type: RGB
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk("IHDR", ihdr),
    chunk("IDAT", zlib.deflateSync(raw)),
    chunk("IEND", Buffer.alloc(0)),
  ]);
}

function crc32(bytes: Buffer): number {
  let c = 0xffffffff;
  for (const b of bytes) {
    c ^= b;
    for (let k = 0; k < 8; k++) c = c & 1 ? (c >>> 1) ^ 0xedb88320 : c >>> 1;
  }
  return (c ^ 0xffffffff) >>> 0;
}

/** A serpentine of `count` sections (straights, hairpins and a tabletop every few), not closed. */
function serpentine(count: number): LayoutDocument {
  const doc = starterDocument("Sixty", 3);
  const sections: LayoutDocument["sections"] = [];
  for (let k = 0; sections.length < count; k++) {
    const jump = k % 3 === 1;
    sections.push(
      jump
        ? {
            id: `j${k}`,
            kind: "jump",
            preset: "tabletop",
            faceHeight: 0.4,
            faceAngleDeg: 25,
            tableLength: 2,
            landingAngleDeg: 25,
          }
        : { id: `s${k}`, kind: "straight", length: 10 },
    );
    sections.push({
      id: `t${k}`,
      kind: "turn",
      radius: 4,
      angleDeg: 180,
      direction: k % 2 ? "right" : "left",
    });
  }
  return { ...doc, sections: sections.slice(0, count) };
}
