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
