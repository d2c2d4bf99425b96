/**
 * Refreshes the pane's screenshots in docs/screenshots: every panel, a refusal and a success,
 * in the light and dark Office themes, at 320 and 450 px wide. Uses the built dist/ (run by
 * `npm run screenshots`, which builds first) and the browser-test harness: Debian's Chromium
 * with the Office stand-in, nothing fetched from outside. The test suite never writes here.
 */
import { mkdirSync } from "node:fs";
import { join, resolve } from "node:path";
import { OFFICE_DARK, OFFICE_LIGHT, openPane, startHarness, stub } from "../test/browser/harness";

const OUT = resolve(__dirname, "../docs/screenshots");

async function main(): Promise<void> {
  mkdirSync(OUT, { recursive: true });
  const h = await startHarness();
  const written: string[] = [];
  try {
    for (const [theme, colours] of [["light", OFFICE_LIGHT], ["dark", OFFICE_DARK]] as const) {
      for (const width of [320, 450]) {
        const shot = async (name: string, take: (path: string) => Promise<unknown>) => {
          const path = join(OUT, `${name}-${theme}-${width}.png`);
          await take(path);
          written.push(path);
        };
        const { page } = await openPane(h, { theme: colours, width });
        await shot("catalogue", (path) => page.screenshot({ path, fullPage: true }));
        await page.click("#tab-templates");
        await shot("templates", (path) => page.screenshot({ path, fullPage: true }));
        await page.click("#tab-guide");
        await page.fill("#guide-search", "speed");
        await page.click('[data-function="ORBITAL_SPEED"] summary');
        await shot("guide", (path) => page.screenshot({ path, fullPage: true }));
        await page.close();

        // A refusal (data in the way) and then a success, each framed around its status.
        const p = await openPane(h, { theme: colours, width });
        await stub(p.page, "setCell", "Sheet1", "D5", "keep me");
        await stub(p.page, "select", "Sheet1", "B2");
        await p.page.click("#insert-table");
        await p.page.waitForSelector("#catalogue-status .msg.warn");
        await p.page.locator("#catalogue-status").scrollIntoViewIfNeeded();
        await shot("refused", (path) => p.page.screenshot({ path }));
        await p.page.click("#catalogue-status .offers button");
        await p.page.waitForSelector("#catalogue-status .msg.ok");
        await shot("inserted", (path) => p.page.screenshot({ path }));
        await p.page.close();
      }
    }
  } finally {
    await h.close();
  }
  console.log(`screenshots written:\n${written.map((w) => `  ${w}`).join("\n")}`);
}

main().catch((e) => {
  console.error(e);
  process.exit(1);
});
