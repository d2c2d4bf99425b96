import { readFileSync } from "node:fs";
import { resolve } from "node:path";
import { describe, expect, it } from "vitest";
import { hostIsDark, luminance } from "../../src/taskpane/theme";

describe("luminance", () => {
  // WCAG 2.1 relative luminance: 0 for black, 1 for white by definition; #808080 is
  // ((128/255 + 0.055)/1.055)^2.4 = 0.21586 (the definition's formula, worked by hand).
  it("follows the WCAG 2.1 definition", () => {
    expect(luminance("#000000")).toBe(0);
    expect(luminance("#ffffff")).toBeCloseTo(1, 12);
    expect(luminance("#808080")).toBeCloseTo(0.21586, 5);
    expect(luminance("#fff")).toBeCloseTo(1, 12);
    expect(luminance("not a colour")).toBeNull();
  });
});

describe("hostIsDark", () => {
  it("believes the host's own flag, else judges the body background", () => {
    expect(hostIsDark({ isDarkTheme: true, bodyBackgroundColor: "#ffffff" })).toBe(true);
    expect(hostIsDark({ bodyBackgroundColor: "#292929" })).toBe(true);
    expect(hostIsDark({ bodyBackgroundColor: "#FFFFFF" })).toBe(false);
    expect(hostIsDark({ bodyBackgroundColor: "#E6E6E6" })).toBe(false);
  });

  it("does not know without a host theme", () => {
    expect(hostIsDark(null)).toBeNull();
    expect(hostIsDark({})).toBeNull();
  });
});

/** WCAG 2.x contrast ratio of two colours (definition: (L1 + 0.05) / (L2 + 0.05), lighter over darker). */
const contrast = (a: string, b: string): number => {
  const [x, y] = [luminance(a)!, luminance(b)!];
  return (Math.max(x, y) + 0.05) / (Math.min(x, y) + 0.05);
};

describe("contrast", () => {
  // Values from the WCAG 2.1 Understanding documents: black on white 21:1, and #767676 on white
  // is the commonly cited lightest grey passing AA at 4.54:1.
  it("follows the WCAG definition", () => {
    expect(contrast("#000000", "#ffffff")).toBeCloseTo(21, 10);
    expect(contrast("#767676", "#ffffff")).toBeCloseTo(4.54, 2);
    expect(contrast("#ffffff", "#767676")).toBeCloseTo(4.54, 2);
  });
});

describe("the pane's palette (taskpane.css)", () => {
  const css = readFileSync(resolve(__dirname, "../../src/taskpane/taskpane.css"), "utf8");
  const icon = readFileSync(resolve(__dirname, "../../assets/icon.svg"), "utf8");

  /** The custom properties of the first rule block after `selector`; var(--host-x, #fallback) gives the fallback. */
  const block = (selector: string): Record<string, string> => {
    const at = css.indexOf(`${selector} {`);
    expect(at, selector).toBeGreaterThanOrEqual(0);
    const body = css.slice(at, css.indexOf("}", at));
    const vars: Record<string, string> = {};
    for (const m of body.matchAll(/(--[a-z0-9-]+):\s*([^;]+);/g)) vars[m[1]] = m[2].replace(/^var\(--host-[a-z-]+,\s*(#[0-9a-f]+)\)$/i, "$1").trim();
    return vars;
  };
  const light = block(":root");
  const dark = block(':root[data-theme="dark"]');
  const systemDark = block(":root:not([data-theme])");

  it("has the same dark palette for Office's dark theme and for a dark system before the host answers", () => {
    expect(systemDark).toEqual(dark);
  });

  // Office reports its own body colours; theme.ts puts them in --host-bg / --host-fg, so the
  // palette must also hold on those (Office's dark theme #292929 on #FFFFFF text; light #FFFFFF).
  const themes: [string, Record<string, string>][] = [
    ["light", light],
    ["light on Office's light body", { ...light, "--bg": "#FFFFFF", "--fg": "#262626" }],
    ["dark", dark],
    ["dark on Office's dark body", { ...dark, "--bg": "#292929", "--fg": "#FFFFFF" }],
  ];
  // Text on its background: WCAG 2.x AA, 4.5:1 (SC 1.4.3).
  const textPairs: [string, string][] = [
    ["--fg", "--bg"], ["--fg", "--surface"], ["--fg", "--surface-2"], ["--fg", "--code-bg"],
    ["--muted", "--bg"], ["--muted", "--surface"], ["--muted", "--surface-2"], ["--muted", "--code-bg"],
    ["--accent", "--bg"], ["--accent", "--surface"], ["--accent-fg", "--accent"], ["--accent-fg", "--accent-hover"],
    ["--fg", "--info-bg"], ["--fg", "--ok-bg"], ["--fg", "--warn-bg"], ["--fg", "--err-bg"],
    ["--muted", "--info-bg"], ["--muted", "--ok-bg"], ["--muted", "--warn-bg"], ["--muted", "--err-bg"],
    ["--badge-fg", "--info"], ["--badge-fg", "--ok"], ["--badge-fg", "--warn"], ["--badge-fg", "--err"],
  ];
  // Focus rings, control edges, the tab underline and a picked box: 3:1 (SC 1.4.11).
  const uiPairs: [string, string][] = [
    ["--focus", "--bg"], ["--focus", "--surface"], ["--control-border", "--bg"], ["--control-border", "--surface"],
    ["--accent", "--bg"], ["--accent", "--surface"], ["--info", "--info-bg"], ["--ok", "--ok-bg"], ["--warn", "--warn-bg"], ["--err", "--err-bg"],
  ];
  for (const [name, vars] of themes) {
    it.each(textPairs)(`${name}: text %s on %s reaches 4.5:1`, (fg, bg) => {
      expect(contrast(vars[fg], vars[bg])).toBeGreaterThanOrEqual(4.5);
    });
    it.each(uiPairs)(`${name}: %s against %s reaches 3:1`, (fg, bg) => {
      expect(contrast(vars[fg], vars[bg])).toBeGreaterThanOrEqual(3);
    });
  }

  /** Hue in degrees of a #rrggbb colour (HSL). */
  const hue = (hex: string): number => {
    const [r, g, b] = [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16) / 255);
    const max = Math.max(r, g, b);
    const d = max - Math.min(r, g, b);
    const h = max === r ? ((g - b) / d) % 6 : max === g ? (b - r) / d + 2 : (r - g) / d + 4;
    return (h * 60 + 360) % 360;
  };
  const iconColours = [...new Set([...icon.matchAll(/#[0-9a-f]{6}/gi)].map((m) => m[0].toLowerCase()))];

  it("draws its accents and focus rings from the icon's colours (the colour itself, or the icon colour's hue within 6 degrees)", () => {
    expect(iconColours.length).toBeGreaterThanOrEqual(4);
    for (const vars of [light, dark])
      for (const key of ["--accent", "--accent-hover", "--focus", "--info"]) {
        const c = vars[key].toLowerCase();
        const near = iconColours.some((i) => i === c || Math.abs(((hue(i) - hue(c) + 540) % 360) - 180) <= 6);
        expect(near, `${key} ${c}`).toBe(true);
      }
  });

  it("gives each status kind its own colours, none equal to the Cautions box's", () => {
    for (const vars of [light, dark]) {
      const backgrounds = ["--info-bg", "--ok-bg", "--warn-bg", "--err-bg"].map((k) => vars[k].toLowerCase());
      expect(new Set(backgrounds).size).toBe(4);
      expect(backgrounds).not.toContain(vars["--surface"].toLowerCase()); // the Cautions box
    }
  });
});
