import { mkdirSync, utimesSync, writeFileSync } from "node:fs";
import { createRequire } from "node:module";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { tempDir } from "./support";

// The compiled runner is rebuilt in a source checkout only when a source its last build read is
// newer than the build (scripts/build-runner.cjs), so the command starts at once otherwise.
const { runnerIsStale } = createRequire(__filename)("../../scripts/build-runner.cjs") as { runnerIsStale: (root: string) => boolean };

function tree(sourceTime: number, builtTime: number): string {
  const root = tempDir();
  mkdirSync(join(root, "dist", "runner"), { recursive: true });
  mkdirSync(join(root, "src"));
  writeFileSync(join(root, "src", "cli.ts"), "export {};\n");
  writeFileSync(join(root, "dist", "runner", "inputs.json"), JSON.stringify(["src/cli.ts"]));
  writeFileSync(join(root, "dist", "runner", "cli.js"), "\"use strict\";\n");
  utimesSync(join(root, "src", "cli.ts"), sourceTime, sourceTime);
  utimesSync(join(root, "dist", "runner", "cli.js"), builtTime, builtTime);
  return root;
}

describe("when the runner is compiled again", () => {
  it("is up to date when every source it read is older than the build", () => {
    expect(runnerIsStale(tree(1_000, 2_000))).toBe(false);
  });

  it("is stale when a source is newer, has gone, or there is no build", () => {
    expect(runnerIsStale(tree(3_000, 2_000))).toBe(true);
    const gone = tree(1_000, 2_000);
    writeFileSync(join(gone, "dist", "runner", "inputs.json"), JSON.stringify(["src/cli.ts", "src/removed.ts"]));
    expect(runnerIsStale(gone)).toBe(true);
    expect(runnerIsStale(tempDir())).toBe(true);
  });
});
