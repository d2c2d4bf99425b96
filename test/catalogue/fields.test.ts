import { describe, expect, it } from "vitest";
import { BODIES } from "../../src/catalogue/bodies";
import { BODY_FIELDS, bodyFieldEntry, bodyFieldValue, bodySourceFor, fieldHeader, fieldKeys, findField } from "../../src/catalogue/fields";
import { SOURCES } from "../../src/catalogue/sources";
import { isDomainError } from "../../src/core/domain";
import { err } from "../support/expect";

describe("field list", () => {
  it("has the fields the sheet functions document, with unique lower_snake keys", () => {
    const keys = fieldKeys();
    for (const k of ["gm", "system_gm", "equatorial_radius", "mean_radius", "polar_radius", "j2", "j2_reference_radius",
      "rotation_period", "parent", "kind", "sma", "ecc", "inc", "orbital_period", "ellipsoid_semi_major_axis",
      "ellipsoid_inverse_flattening", "ellipsoid_gm", "ellipsoid_rotation_rate", "ellipsoid_j2"])
      expect(keys).toContain(k);
    expect(new Set(keys).size).toBe(keys.length);
    for (const k of keys) expect(k).toMatch(/^[a-z][a-z0-9_]*$/);
  });

  it("headers carry the unit where there is one", () => {
    expect(fieldHeader(findField("mean_radius") as (typeof BODY_FIELDS)[number])).toBe("Mean radius (km)");
    expect(fieldHeader(findField("ecc") as (typeof BODY_FIELDS)[number])).toBe("Eccentricity");
  });
});

describe("bodyFieldValue", () => {
  const earth = BODIES.find((b) => b.name === "Earth")!;

  it("reads each numeric field from the catalogue entry", () => {
    expect(bodyFieldValue(earth, "gm")).toBe(earth.gm.value);
    expect(bodyFieldValue(earth, "system_gm")).toBe(earth.systemGm!.value);
    expect(bodyFieldValue(earth, "equatorial_radius")).toBe(earth.equatorialRadius.value);
    expect(bodyFieldValue(earth, "mean_radius")).toBe(earth.meanRadius.value);
    expect(bodyFieldValue(earth, "polar_radius")).toBe(earth.polarRadius!.value);
    expect(bodyFieldValue(earth, "j2")).toBe(earth.j2!.value);
    expect(bodyFieldValue(earth, "j2_reference_radius")).toBe(earth.j2ReferenceRadius!.value);
    expect(bodyFieldValue(earth, "rotation_period")).toBe(earth.rotationPeriod!.value);
    expect(bodyFieldValue(earth, "sma")).toBe(earth.orbit!.sma.value);
    expect(bodyFieldValue(earth, "ecc")).toBe(earth.orbit!.ecc.value);
    expect(bodyFieldValue(earth, "inc")).toBe(earth.orbit!.inc.value);
    expect(bodyFieldValue(earth, "orbital_period")).toBe(earth.orbit!.period.value);
  });

  it("matches field keys case-insensitively and accepts a body name", () => {
    expect(bodyFieldValue("earth", "GM")).toBe(earth.gm.value);
    expect(bodyFieldValue("EARTH", " Mean_Radius ")).toBe(earth.meanRadius.value);
  });

  it("offers Earth's WGS 84 ellipsoid with its source, and no ellipsoid for a body without one", () => {
    const w = earth.ellipsoid!;
    expect(bodyFieldValue(earth, "ellipsoid_semi_major_axis")).toBe(w.semiMajorAxis.value);
    expect(bodyFieldValue(earth, "ellipsoid_inverse_flattening")).toBe(w.inverseFlattening.value);
    expect(bodyFieldValue(earth, "ellipsoid_gm")).toBe(w.gm.value);
    expect(bodyFieldValue(earth, "ellipsoid_rotation_rate")).toBe(w.rotationRate.value);
    expect(bodyFieldValue(earth, "ellipsoid_j2")).toBe(w.j2.value);
    expect(bodySourceFor(earth, "ellipsoid_gm")).toBe("NIMA TR8350.2 (WGS 84)");
    expect(err(bodyFieldValue("Mars", "ellipsoid_gm")).message).toBe("field: the catalogue has no ellipsoid GM for Mars.");
  });

  it("gives text for parent and kind", () => {
    expect(bodyFieldValue("Moon", "parent")).toBe("Earth");
    expect(bodyFieldValue("Vesta", "kind")).toBe("asteroid");
    expect(bodyFieldValue("Pluto", "Kind")).toBe("dwarf planet");
  });

  it("system_gm is the GM itself for a body without moons", () => {
    const venus = BODIES.find((b) => b.name === "Venus")!;
    expect(bodyFieldValue(venus, "system_gm")).toBe(venus.gm.value);
  });

  it("an unknown field is a bad argument that lists every valid key", () => {
    const e = err(bodyFieldValue(earth, "radius"));
    expect(e.kind).toBe("bad_argument");
    expect(e.parameter).toBe("field");
    expect(e.message.startsWith('field: got "radius"; expected one of the field names')).toBe(true);
    for (const k of fieldKeys()) expect(e.message).toContain(k);
    expect(err(bodyFieldValue(earth, "radius", "fields")).parameter).toBe("fields");
    expect(err(bodyFieldValue(earth, 3 as unknown as string)).kind).toBe("bad_argument");
  });

  it("a field the body lacks is no answer, saying the catalogue has none for that body", () => {
    const deimosJ2 = err(bodyFieldValue("Deimos", "j2"));
    expect(deimosJ2.kind).toBe("no_answer");
    expect(deimosJ2.message).toBe("field: the catalogue has no J2 for Deimos.");
    const sunParent = err(bodyFieldValue("Sun", "parent"));
    expect(sunParent.kind).toBe("no_answer");
    expect(sunParent.message).toBe("field: the catalogue has no parent for Sun.");
    expect(err(bodyFieldValue("Sun", "sma")).kind).toBe("no_answer");
  });

  it("an unknown body name is a bad argument on the body parameter", () => {
    const e = err(bodyFieldValue("Marz", "gm"));
    expect(e.kind).toBe("bad_argument");
    expect(e.parameter).toBe("body");
    expect(e.message).toContain("Mars");
  });

  it("every field of every body is a finite number, a text, or no answer", () => {
    for (const b of BODIES)
      for (const k of fieldKeys()) {
        const r = bodyFieldValue(b, k);
        if (isDomainError(r)) expect(r.kind, `${b.name}.${k}`).toBe("no_answer");
        else if (typeof r === "number") expect(Number.isFinite(r), `${b.name}.${k}`).toBe(true);
        else expect(r.length).toBeGreaterThan(0);
      }
  });

  it("exposes the whole entry, with its memory and computation flags", () => {
    const charonSma = bodyFieldEntry("Charon", "sma");
    expect(typeof charonSma === "object" && !isDomainError(charonSma) && charonSma.fromMemory).toBe(true);
    const ioSpin = bodyFieldEntry("Io", "rotation_period");
    expect(typeof ioSpin === "object" && !isDomainError(ioSpin) && ioSpin.computed).toContain("W-dot");
  });
});

describe("bodySourceFor", () => {
  it("gives the short citation label of the value", () => {
    expect(bodySourceFor("Earth", "gm")).toBe("JPL DE440");
    expect(bodySourceFor("Earth", "j2")).toBe("EGM2008 (tide-free)");
    expect(bodySourceFor("Jupiter", "POLAR_RADIUS")).toBe("IAU 2015 B3");
    expect(bodySourceFor("Moon", "kind")).toBe("IAU 2006 B5, B6");
    expect(bodySourceFor("Moon", "parent")).toBe(SOURCES.JPL_SAT_ELEM.label);
  });

  it("has a source for every value the catalogue holds", () => {
    for (const b of BODIES)
      for (const k of fieldKeys()) {
        const value = bodyFieldValue(b, k);
        const source = bodySourceFor(b, k);
        expect(isDomainError(source), `${b.name}.${k}`).toBe(isDomainError(value));
      }
  });

  it("keeps the errors of the value lookup", () => {
    expect(err(bodySourceFor("Sun", "parent")).kind).toBe("no_answer");
    expect(err(bodySourceFor("Earth", "colour")).kind).toBe("bad_argument");
  });
});
