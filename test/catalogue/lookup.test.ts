import { describe, expect, it } from "vitest";
import { BODIES } from "../../src/catalogue/bodies";
import { bodyNames, closeNames, findBody } from "../../src/catalogue/lookup";
import type { Body } from "../../src/catalogue/types";
import { DomainError, isDomainError } from "../../src/core/domain";

const nameOf = (r: Body | DomainError) => (isDomainError(r) ? r.message : r.name);

describe("findBody", () => {
  it("finds every catalogue body by its name in any case, with surrounding spaces", () => {
    for (const b of BODIES) {
      expect(nameOf(findBody(b.name.toUpperCase()))).toBe(b.name);
      expect(nameOf(findBody(` ${b.name.toLowerCase()}  `))).toBe(b.name);
    }
  });

  it("finds bodies by their aliases", () => {
    expect(nameOf(findBody("luna"))).toBe("Moon");
    expect(nameOf(findBody("1 Ceres"))).toBe("Ceres");
    expect(nameOf(findBody("4 VESTA"))).toBe("Vesta");
    expect(nameOf(findBody("134340 Pluto"))).toBe("Pluto");
  });

  it("does not take poetic names as aliases", () => {
    expect(isDomainError(findBody("Sol"))).toBe(true);
  });

  it("an unknown name is a bad argument naming the parameter and suggesting close names", () => {
    const r = findBody("Marz");
    expect(isDomainError(r)).toBe(true);
    const e = r as DomainError;
    expect(e.kind).toBe("bad_argument");
    expect(e.parameter).toBe("body");
    expect(e.message).toMatch(/^body: got "Marz"; expected a catalogue body name such as Mars/);
    const other = findBody("Jupyter", "to") as DomainError;
    expect(other.parameter).toBe("to");
    expect(other.message).toContain("Jupiter");
  });
});

describe("closeNames", () => {
  it("puts the nearest spelling first", () => {
    expect(closeNames("Marz")[0]).toBe("Mars");
    expect(closeNames("Titn")[0]).toBe("Titan");
    expect(closeNames("ganimede")[0]).toBe("Ganymede");
  });

  it("puts prefix matches first and returns the count asked for", () => {
    expect(closeNames("Sat", 1)).toEqual(["Saturn"]);
    expect(closeNames("e", 5)).toHaveLength(5);
  });
});

describe("bodyNames", () => {
  it("lists every body once, Sun first", () => {
    const names = bodyNames();
    expect(names[0]).toBe("Sun");
    expect(new Set(names).size).toBe(BODIES.length);
  });
});
