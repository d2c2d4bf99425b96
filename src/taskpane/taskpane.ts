/**
 * Pane entry: builds the three panels from bundled data (catalogue, templates, functions.json),
 * shows them at once, then enables the buttons that write to the workbook when Excel is ready.
 */
import metadata from "orbit-functions-metadata";
import { REGISTRY_GLOBAL, type Registry } from "../functions/registry";
import { guideEntries } from "./guide";
import { applyTheme, readHostTheme } from "./theme";
import { mountCatalogue } from "./ui/catalogueView";
import { byId, clear } from "./ui/dom";
import { mountGuide } from "./ui/guideView";
import { showMessage } from "./ui/status";
import { mountTabs } from "./ui/tabs";
import { mountTemplates } from "./ui/templatesView";

const root = document.documentElement;
const systemDark = window.matchMedia?.("(prefers-color-scheme: dark)");
const followTheme = () => applyTheme(root, readHostTheme(), systemDark?.matches ?? false);
followTheme();
systemDark?.addEventListener?.("change", followTheme);

mountTabs(byId("app").querySelector<HTMLElement>('[role="tablist"]')!);
const available = new Set(metadata.functions.map((f) => f.id));
const catalogue = mountCatalogue(available);
const templates = mountTemplates(available);
// functions.js runs first in this page (shared runtime) and publishes its declarations.
const registry = (globalThis as Record<string, unknown>)[REGISTRY_GLOBAL] as Registry | undefined;
const guide = mountGuide(guideEntries(metadata.functions, registry?.specs ?? new Map()));
// Status areas stay empty (and take no room) until there is something to say.
const statuses = [catalogue.status, templates.status];
document.body.classList.remove("pending");

function ready(inExcel: boolean): void {
  followTheme();
  for (const s of statuses) {
    if (inExcel) clear(s);
    else showMessage(s, "warn", "Open this pane in Excel to insert.");
  }
  catalogue.setEnabled(inExcel);
  templates.setEnabled(inExcel);
  guide.setEnabled(inExcel);
}

const office = (globalThis as { Office?: typeof Office }).Office;
if (office?.onReady) {
  void office.onReady((info) => {
    const inExcel = info.host === office.HostType.Excel && typeof Excel !== "undefined" && typeof Excel.run === "function";
    const recentEnough = inExcel && (office.context?.requirements?.isSetSupported?.("ExcelApi", "1.7") ?? true);
    ready(inExcel && recentEnough);
    if (inExcel && !recentEnough) statuses.forEach((s) => showMessage(s, "warn", "This Excel is too old to insert (the pane needs ExcelApi 1.7)."));
    try {
      office.context?.document?.addHandlerAsync?.(office.EventType.OfficeThemeChanged, followTheme);
    } catch {
      // Hosts without theme events keep the theme read at start.
    }
  });
} else {
  ready(false);
}
