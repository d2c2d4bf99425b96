/** The "Body catalogue" panel: pick bodies, fields and units, preview, insert as a table. */
import { BODIES } from "../../catalogue/bodies";
import { BODY_FIELDS } from "../../catalogue/fields";
import {
  bodyGroups,
  buildTablePlan,
  DEFAULT_BODIES,
  DEFAULT_FIELDS,
  DEFAULT_UNITS,
  DERIVED_FIELDS,
  formatWith,
  isFormulaCell,
  matchesFilter,
  type DistanceUnit,
  type GmUnit,
  type TablePlan,
  type TimeUnit,
  type Units,
} from "../catalogueTable";
import { insertCatalogueTable } from "../excel";
import { byId, clear, el } from "./dom";
import { mountPickList } from "./pickList";
import { at, showError, showMessage, showOutcome, type Where } from "./status";

const NEW_SHEET = "Body catalogue";

export interface CatalogueView {
  setEnabled(on: boolean): void;
  status: HTMLElement;
}

/** `available`: ids of the worksheet functions in this build (derived columns need theirs). */
export function mountCatalogue(available: ReadonlySet<string>): CatalogueView {
  const groups = bodyGroups();
  const allBodies = groups.flatMap((g) => g.bodies);
  const chosenBodies = new Set(allBodies.filter((b) => DEFAULT_BODIES.includes(b.name)).map((b) => b.name));
  const chosenFields = new Set(BODY_FIELDS.filter((f) => DEFAULT_FIELDS.includes(f.key)).map((f) => f.key));
  const derivedOffered = DERIVED_FIELDS.filter((d) => available.has(d.fn));
  const chosenDerived = new Set<string>();
  const units: Units = { ...DEFAULT_UNITS };

  const filter = byId<HTMLInputElement>("body-filter");
  const bodyList = byId("body-list");
  const fieldList = byId("field-list");
  const preview = byId("preview");
  const previewSize = byId("preview-size");
  const previewNotes = byId("preview-notes");
  const insertBtn = byId<HTMLButtonElement>("insert-table");
  const sheetBtn = byId<HTMLButtonElement>("insert-table-sheet");
  const status = byId("catalogue-status");
  const bodyCount = byId("body-count");
  const skip = byId<HTMLAnchorElement>("skip-to-insert");
  // The skip link lands on Insert table, or, while it cannot be used, on the hint that says why.
  skip.addEventListener("click", (ev) => {
    ev.preventDefault();
    (insertBtn.disabled ? byId("insert-hint") : insertBtn).focus();
  });

  // Bodies, grouped, as one list with one tab stop (arrow keys inside).
  const bodyPicks = mountPickList(
    bodyList,
    groups.map((g) => ({ title: g.title, options: g.bodies.map((b) => ({ key: b.name, label: b.name, attribute: "data-body", selected: chosenBodies.has(b.name) })) })),
    (name, on) => {
      if (on) chosenBodies.add(name);
      else chosenBodies.delete(name);
      refresh();
    },
  );
  const noMatch = el("p", { class: "empty-filter", hidden: true }, "No body matches the filter.");
  bodyList.appendChild(noMatch);

  const applyFilter = () => {
    noMatch.hidden = bodyPicks.show((name) => matchesFilter(allBodies.find((b) => b.name === name)!, filter.value)) > 0;
    countBodies();
  };
  filter.addEventListener("input", applyFilter);

  document.querySelectorAll<HTMLButtonElement>("[data-pick]").forEach((b) =>
    b.addEventListener("click", () => {
      const pick = b.dataset.pick;
      if (pick === "none") chosenBodies.clear();
      else if (pick === "planets") {
        chosenBodies.clear();
        for (const body of allBodies) if (body.kind === "star" || body.kind === "planet") chosenBodies.add(body.name);
      } else for (const body of allBodies) if (matchesFilter(body, filter.value)) chosenBodies.add(body.name);
      bodyPicks.setSelected(chosenBodies);
      refresh();
    }),
  );

  /**
   * "10 of 38 picked", and which picked bodies cannot be seen now: scrolled out of the list or
   * hidden by the filter, so nothing picked is ever out of sight without the pane saying so.
   */
  function countBodies(): void {
    const box = bodyList.getBoundingClientRect();
    const outOfView: string[] = [];
    const filtered: string[] = [];
    for (const b of allBodies) {
      if (!chosenBodies.has(b.name)) continue;
      const o = bodyPicks.option(b.name)!;
      if (o.hidden) filtered.push(b.name);
      else {
        const r = o.getBoundingClientRect();
        if (r.top < box.top - 1 || r.bottom > box.bottom + 1) outOfView.push(b.name);
      }
    }
    const n = chosenBodies.size;
    const parts = [`${n} of ${allBodies.length} ${allBodies.length === 1 ? "body" : "bodies"} picked.`];
    if (outOfView.length > 0) parts.push(`Scrolled out of view: ${outOfView.join(", ")}.`);
    if (filtered.length > 0) parts.push(`Hidden by the filter: ${filtered.join(", ")}.`);
    bodyCount.textContent = parts.join(" ");
  }
  let countQueued = false;
  const queueCount = () => {
    if (countQueued) return;
    countQueued = true;
    requestAnimationFrame(() => {
      countQueued = false;
      countBodies();
    });
  };
  bodyList.addEventListener("scroll", queueCount, { passive: true });
  window.addEventListener("resize", queueCount);

  // Fields, in catalogue order, then the columns the sheet computes; one list, one tab stop.
  mountPickList(
    fieldList,
    [
      { options: BODY_FIELDS.map((f) => ({ key: f.key, label: f.label, attribute: "data-field", title: f.description, selected: chosenFields.has(f.key) })) },
      ...(derivedOffered.length > 0
        ? [
            {
              title: "Computed in the sheet (live formulas)",
              options: derivedOffered.map((d) => ({ key: `derived:${d.key}`, value: d.key, label: d.label, attribute: "data-derived", title: `${d.description}: a live ORBIT.${d.fn} formula on each row`, selected: false })),
            },
          ]
        : []),
    ],
    (key, on) => {
      const [set, k] = key.startsWith("derived:") ? [chosenDerived, key.slice("derived:".length)] : [chosenFields, key];
      if (on) set.add(k);
      else set.delete(k);
      refresh();
    },
  );

  // Units.
  const bindUnit = (name: string, set: (v: string) => void) =>
    document.querySelectorAll<HTMLInputElement>(`input[name="${name}"]`).forEach((r) =>
      r.addEventListener("change", () => {
        if (r.checked) {
          set(r.value);
          refresh();
        }
      }),
    );
  bindUnit("unit-distance", (v) => (units.distance = v as DistanceUnit));
  bindUnit("unit-gm", (v) => (units.gm = v as GmUnit));
  bindUnit("unit-time", (v) => (units.time = v as TimeUnit));

  let plan: TablePlan = currentPlan();
  let enabled = false;

  function currentPlan(): TablePlan {
    return buildTablePlan({
      // Catalogue order: each moon right after its planet.
      bodies: BODIES.filter((b) => chosenBodies.has(b.name)).map((b) => b.name),
      fields: BODY_FIELDS.filter((f) => chosenFields.has(f.key)).map((f) => f.key),
      derived: derivedOffered.filter((d) => chosenDerived.has(d.key)).map((d) => d.key),
      units,
    });
  }

  function renderPreview(): void {
    clear(preview);
    const n = plan.rows.length;
    const k = plan.header.length - 2;
    previewSize.textContent = `${n} ${n === 1 ? "body" : "bodies"} × ${k} ${k === 1 ? "field" : "fields"}`;
    const s = plan.sourcesUsed.length;
    // Always one line (an empty plan says so too), so the page below never moves.
    previewNotes.textContent = plan.notes.length > 0 ? `Below it: ${plan.notes.length} note rows citing ${s} ${s === 1 ? "source" : "sources"}.` : "No note rows.";
    if (n === 0 || k === 0) {
      preview.appendChild(el("p", { class: "preview-empty" }, n === 0 ? "Choose at least one body." : "Choose at least one field."));
      return;
    }
    const head = el("tr", {}, ...plan.header.map((h) => el("th", { scope: "col" }, h)));
    const last = plan.header.length - 1;
    const rows = plan.rows.map((r, ri) =>
      el(
        "tr",
        {},
        ...r.map((v, i) =>
          i === 0
            ? el("th", { scope: "row" }, String(v))
            : i === last
              ? el("td", { class: "src" }, String(v))
              : isFormulaCell(v)
                ? el("td", { class: "live", title: v.formula.replace("{body}", "this row's body") }, "formula")
                : v === ""
                  ? el("td", { class: "none", title: "not in the catalogue" }, "—")
                  : el("td", {}, formatWith(v, plan.numberFormats[ri][i])),
        ),
      ),
    );
    preview.appendChild(el("table", {}, el("thead", {}, head), el("tbody", {}, ...rows)));
    // Say when rows lie below the preview's edge (the default bodies all fit).
    if (preview.scrollHeight > preview.clientHeight + 1) previewSize.textContent += " (scroll for all rows)";
  }

  function refresh(): void {
    plan = currentPlan();
    renderPreview();
    countBodies();
    const ready = enabled && plan.rows.length > 0 && plan.header.length > 2;
    insertBtn.disabled = !ready;
    sheetBtn.disabled = !ready;
  }

  async function insert(where: Where | "selection"): Promise<void> {
    const snapshot = plan;
    insertBtn.disabled = sheetBtn.disabled = true;
    status.setAttribute("aria-busy", "true");
    showMessage(status, "info", "Checking the target cells…");
    try {
      const o = await insertCatalogueTable(snapshot, where);
      showOutcome(status, o, {
        verb: "Insert",
        newSheet: NEW_SHEET,
        retry: (w) => void insert(w),
        done: (w) => `Inserted table ${w.tableName} at ${at(w.sheet, w.address)}: ${snapshot.rows.length} bodies, with ${snapshot.sourcesUsed.length} cited sources below it.`,
      });
    } catch (e) {
      showError(status, e);
    } finally {
      status.removeAttribute("aria-busy");
      refresh();
    }
  }
  insertBtn.addEventListener("click", () => void insert("selection"));
  sheetBtn.addEventListener("click", () => void insert({ newSheet: NEW_SHEET }));

  refresh();
  return {
    status,
    setEnabled(on: boolean) {
      enabled = on;
      refresh();
    },
  };
}
