import { existsSync, readdirSync, readFileSync, statSync } from "node:fs";
import { join, resolve } from "node:path";
import { describe, expect, it } from "vitest";

// Static checks of the pane's security rules on its sources and on the BUILT page: a strict
// Content-Security-Policy, no inline script or style, no markup built from strings, no eval, no
// network use of its own (the function metadata is bundled, not fetched).
const root = resolve(__dirname, "../..");
const dist = join(root, "dist");
if (!existsSync(join(dist, "taskpane.html"))) throw new Error("dist/taskpane.html is missing: run `npm run build` (npm test does it)");
const html = readFileSync(join(dist, "taskpane.html"), "utf8");
const bundle = readFileSync(join(dist, "taskpane.js"), "utf8");

const sources = (dir: string): string[] =>
  readdirSync(dir).flatMap((f) => {
    const p = join(dir, f);
    return statSync(p).isDirectory() ? sources(p) : p.endsWith(".ts") ? [p] : [];
  });
const paneSources = sources(join(root, "src/taskpane")).map((p) => ({ p, text: readFileSync(p, "utf8") }));

describe("the built pane page", () => {
  const csp = /<meta http-equiv="?Content-Security-Policy"? content="([^"]+)"/i.exec(html)?.[1] ?? "";

  it("declares a Content-Security-Policy without unsafe-inline or unsafe-eval", () => {
    expect(csp).toContain("default-src 'none'");
    expect(csp).toMatch(/script-src 'self' https:\/\/appsforoffice\.microsoft\.com(;|$)/);
    expect(csp).toContain("style-src 'self'");
    expect(csp).not.toMatch(/unsafe-(inline|eval)/);
  });

  it("has no inline script, inline style or event-handler attribute", () => {
    for (const tag of html.match(/<script\b[^>]*>/gi) ?? []) expect(tag).toMatch(/\bsrc=/);
    expect(html).not.toMatch(/<script\b[^>]*>[^<\s]/i);
    expect(html).not.toMatch(/<style\b/i);
    expect(html).not.toMatch(/\sstyle=/i);
    expect(html).not.toMatch(/\son[a-z]+=/i);
  });

  it("loads scripts only from itself and the Office.js address the host requires", () => {
    const srcs = [...html.matchAll(/<script\b[^>]*\bsrc="?([^"\s>]+)/gi)].map((m) => m[1]);
    expect(srcs).toEqual(["https://appsforoffice.microsoft.com/lib/1/hosted/office.js", "functions.js", "taskpane.js"]);
  });
});

describe("the pane's code", () => {
  it("never builds markup from strings or evaluates code", () => {
    for (const { p, text } of paneSources) expect({ p, bad: text.match(/innerHTML|outerHTML|insertAdjacentHTML|document\.write|\beval\(|new Function\(/g) }).toEqual({ p, bad: null });
    expect(bundle).not.toMatch(/innerHTML|insertAdjacentHTML|document\.write|\beval\(|new Function\(/);
  });

  it("makes no request of its own: no fetch, XMLHttpRequest, WebSocket or beacon", () => {
    for (const { p, text } of paneSources) expect({ p, bad: text.match(/\bfetch\(|XMLHttpRequest|WebSocket|sendBeacon|EventSource/g) }).toEqual({ p, bad: null });
    expect(bundle).not.toMatch(/\bfetch\(|XMLHttpRequest|WebSocket|sendBeacon|EventSource/);
  });

  it("bundles the function metadata (every id of functions.json is in taskpane.js)", () => {
    const ids = (JSON.parse(readFileSync(join(dist, "functions.json"), "utf8")) as { functions: { id: string }[] }).functions.map((f) => f.id);
    expect(ids.filter((id) => !bundle.includes(`"${id}"`))).toEqual([]);
  });
});
