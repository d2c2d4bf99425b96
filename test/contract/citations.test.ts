import { execFileSync } from "node:child_process";
import { existsSync, readFileSync } from "node:fs";
import { resolve } from "node:path";
import { describe, expect, it } from "vitest";

// The project explains itself: every citation in code resolves inside the repository (a file
// that exists, a section of README.md or DEVELOPERS.md that exists) or names a published source,
// and nothing points at a machine's own paths or at documents outside the repository.
const root = resolve(__dirname, "../..");
const tracked = execFileSync("git", ["ls-files"], { cwd: root, encoding: "utf8" })
  .split("\n")
  .filter((f) => /\.(ts|mts|js|mjs|cjs|css|html)$/.test(f) && existsSync(resolve(root, f)));
// What a file says in its comments: block comments and line comments (strings are data, not citations).
// Comment lines are joined (their leading "*" or "//" dropped), so a citation broken across lines reads whole.
const comments = (source: string): string =>
  [...source.matchAll(/\/\*[\s\S]*?\*\/|(?<![:"'`\\])\/\/[^\n]*/g)]
    .map((m) => m[0])
    .join("\n")
    .replace(/\n\s*(\*(?!\/)|\/\/)\s*/g, " ");
const text = new Map(tracked.map((f) => [f, comments(readFileSync(resolve(root, f), "utf8"))]));
const headings = (doc: string): Set<string> =>
  new Set(
    readFileSync(resolve(root, doc), "utf8")
      .split("\n")
      .filter((l) => /^#{1,4} /.test(l))
      .map((l) => l.replace(/^#+ /, "").trim()),
  );

describe("citations in code", () => {
  it("name files of the repository that exist", () => {
    const missing: string[] = [];
    for (const [f, t] of text)
      for (const m of t.matchAll(/\b((?:src|test|bench|scripts|docs|examples|assets)\/[A-Za-z0-9_./-]*[A-Za-z0-9_])\.(ts|mjs|cjs|js|json|md|svg|css|html)\b/g)) {
        const path = `${m[1]}.${m[2]}`;
        if (!existsSync(resolve(root, path))) missing.push(`${f}: ${path}`);
      }
    expect(missing).toEqual([]);
  });

  it("name sections of README.md and DEVELOPERS.md that exist", () => {
    const missing: string[] = [];
    for (const doc of ["README.md", "DEVELOPERS.md"]) {
      const have = headings(doc);
      for (const [f, t] of text)
        for (const m of t.matchAll(new RegExp(`${doc.replace(".", "\\.")},? (?:section )?"([^"]+)"`, "g")))
          if (!have.has(m[1])) missing.push(`${f}: ${doc} "${m[1]}"`);
    }
    expect(missing).toEqual([]);
  });

  it("never point at a machine's own paths, at a specification outside the repository, or at an issue number", () => {
    const found: string[] = [];
    for (const [f, t] of text) {
      if (f === "test/contract/citations.test.ts") continue;
      for (const m of t.matchAll(/\/work\/|\/home\/\w|DESIGN\.md|CONSTANTS\.md|\bissue \d+\b/gi)) found.push(`${f}: ${m[0]}`);
    }
    expect(found).toEqual([]);
  });
});
