// Rasterises assets/icon.svg, the one source of the add-in's icon, into every PNG size the
// manifest names (assets/icon-16.png ... icon-128.png), with a transparent background.
// Uses Debian's Chromium through playwright-core (a dev dependency; no browser is downloaded).
// Run after editing the SVG: node scripts/make-icons.mjs   (CHROMIUM=/path overrides the browser)
import { readFileSync, writeFileSync } from "node:fs";
import { chromium } from "playwright-core";

const SIZES = [16, 32, 64, 80, 128];
const svg = readFileSync("assets/icon.svg", "utf8");
const src = `data:image/svg+xml;base64,${Buffer.from(svg).toString("base64")}`;

const browser = await chromium.launch({
  executablePath: process.env.CHROMIUM ?? "/usr/bin/chromium",
  headless: true,
  args: ["--no-sandbox", "--disable-gpu", "--disable-background-networking", "--disable-component-update", "--no-first-run"],
});
try {
  const page = await browser.newPage({ deviceScaleFactor: 1 });
  for (const size of SIZES) {
    await page.setViewportSize({ width: size, height: size });
    await page.setContent(`<html><body style="margin:0;background:transparent"><img id="i" width="${size}" height="${size}" src="${src}"></body></html>`);
    await page.waitForFunction(() => document.getElementById("i").complete);
    writeFileSync(`assets/icon-${size}.png`, await page.locator("#i").screenshot({ omitBackground: true }));
  }
} finally {
  await browser.close();
}
console.log(`icons written: ${SIZES.map((s) => `assets/icon-${s}.png`).join(", ")}`);
