import { readFileSync } from "node:fs";
import { resolve } from "node:path";
import { XMLParser } from "fast-xml-parser";
import { describe, expect, it } from "vitest";

// Offline manifest checks (the online validator needs a network service): the file parses, its
// ids and resids are consistent, the namespace is ORBIT, the shared runtime hosts both the
// functions and the pane, and every URL lives under one base.
const root = resolve(__dirname, "../..");
const parser = new XMLParser({ ignoreAttributes: false, attributeNamePrefix: "@", removeNSPrefix: true, isArray: (name) => ["Url", "String", "Image", "Runtime", "Set", "Control"].includes(name) });

function check(path: string) {
  const xml = readFileSync(path, "utf8");
  const doc = parser.parse(xml).OfficeApp;
  const host = doc.VersionOverrides.Hosts.Host;
  const res = doc.VersionOverrides.Resources;
  const urls = new Map<string, string>(res.Urls.Url.map((u: any) => [u["@id"], u["@DefaultValue"]]));
  const images = new Map<string, string>(res.Images.Image.map((u: any) => [u["@id"], u["@DefaultValue"]]));
  const strings = new Map<string, string>([...res.ShortStrings.String, ...res.LongStrings.String].map((u: any) => [u["@id"], u["@DefaultValue"]]));
  return { xml, doc, host, urls, images, strings };
}

describe.each(["manifest.xml", "dist/manifest.xml"])("%s", (file) => {
  const { xml, doc, host, urls, images, strings } = check(resolve(root, file));

  it("has a stable GUID id and a four-part version", () => {
    expect(doc.Id).toBe("534d2e4e-aefb-4bf1-ab49-4c9ece48591c");
    expect(doc.Version).toMatch(/^\d+\.\d+\.\d+\.\d+$/);
  });

  it("declares custom functions in the ORBIT namespace", () => {
    const cf = host.AllFormFactors.ExtensionPoint;
    expect(cf["@type"]).toBe("CustomFunctions");
    expect(strings.get(cf.Namespace["@resid"])).toBe("ORBIT");
    expect(urls.get(cf.Script.SourceLocation["@resid"])).toMatch(/\/functions\.js$/);
    expect(urls.get(cf.Metadata.SourceLocation["@resid"])).toMatch(/\/functions\.json$/);
  });

  it("runs functions and pane in one shared runtime", () => {
    const runtime = host.Runtimes.Runtime[0];
    expect(runtime["@lifetime"]).toBe("long");
    const page = host.AllFormFactors.ExtensionPoint.Page.SourceLocation["@resid"];
    expect(runtime["@resid"]).toBe(page);
    const button = host.DesktopFormFactor.ExtensionPoint.OfficeTab.Group.Control[0];
    expect(button.Action.SourceLocation["@resid"]).toBe(page);
    expect(host.DesktopFormFactor.FunctionFile["@resid"]).toBe(page);
    expect(doc.Requirements.Sets.Set.map((s: any) => s["@Name"])).toContain("SharedRuntime");
  });

  it("defines every resid it uses", () => {
    const used = [...xml.matchAll(/resid="([^"]+)"/g)].map((m) => m[1]);
    expect(used.length).toBeGreaterThan(10);
    for (const id of used) expect(urls.has(id) || images.has(id) || strings.has(id), id).toBe(true);
  });

  it("keeps every URL under one https base, also listed as an app domain", () => {
    const all = [...xml.matchAll(/DefaultValue="(https?:\/\/[^"]+)"/g)].map((m) => m[1]);
    const base = new URL(urls.get("Taskpane.Url")!).origin;
    for (const u of all) expect(u.startsWith(base + "/"), u).toBe(true);
    expect(base.startsWith("https://")).toBe(true);
    expect([doc.AppDomains.AppDomain].flat()).toContain(base);
  });

  it("points its icons at files the build ships", () => {
    for (const u of [...images.values(), doc.IconUrl["@DefaultValue"], doc.HighResolutionIconUrl["@DefaultValue"]]) {
      const rel = new URL(u).pathname.slice(1);
      expect(() => readFileSync(resolve(root, "dist", rel))).not.toThrow();
    }
  });
});
