/** The "Body catalogue" panel: pick bodies, fields and units, preview, insert as a table. */
import { BODY_FIELDS, type BodyField } from "../../catalogue/fields";
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

  // Bodies, grouped; every checkbox has its own label.
  const boxes = new Map<string, HTMLInputElement>();
  const groupNodes: { node: HTMLElement; items: { li: HTMLElement; name: string }[] }[] = [];
  for (const g of groups) {
    const titleId = `group-${g.title.toLowerCase().replace(/[^a-z0-9]+/g, "-")}`;
    const items = g.bodies.map((b) => {
      const box = el("input", { type: "checkbox", value: b.name, "data-body": b.name });
      box.checked = chosenBodies.has(b.name);
      box.addEventListener("change", () => {
        if (box.checked) chosenBodies.add(b.name);
        else chosenBodies.delete(b.name);
        refresh();
      });
      boxes.set(b.name, box);
      return { li: el("li", {}, el("label", { class: "check" }, box, b.name)), name: b.name };
    });
    const node = el("div", { class: "body-group", role: "group", "aria-labelledby": titleId }, el("p", { class: "body-group-title", id: titleId }, g.title), el("ul", {}, ...items.map((i) => i.li)));
    groupNodes.push({ node, items });
    bodyList.appendChild(node);
  }
  const noMatch = el("p", { class: "empty-filter", hidden: true }, "No body matches the filter.");
  bodyList.appendChild(noMatch);

  const applyFilter = () => {
    let shown = 0;
    for (const g of groupNodes) {
      let inGroup = 0;
      for (const it of g.items) {
        const body = allBodies.find((b) => b.name === it.name)!;
        const match = matchesFilter(body, filter.value);
        it.li.hidden = !match;
        if (match) inGroup++;
      }
      g.node.hidden = inGroup === 0;
      shown += inGroup;
    }
    noMatch.hidden = shown > 0;
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
      for (const [name, box] of boxes) box.checked = chosenBodies.has(name);
      refresh();
    }),
  );

  // Fields, in catalogue order.
  const fieldItems = BODY_FIELDS.map((f: BodyField) => {
    const box = el("input", { type: "checkbox", value: f.key, "data-field": f.key, title: f.description });
    box.checked = chosenFields.has(f.key);
    box.addEventListener("change", () => {
      if (box.checked) chosenFields.add(f.key);
      else chosenFields.delete(f.key);
      refresh();
    });
    return el("li", {}, el("label", { class: "check", title: f.description }, box, f.label));
  });
  fieldList.appendChild(el("ul", {}, ...fieldItems));
  if (derivedOffered.length > 0) {
    const derivedItems = derivedOffered.map((d) => {
      const box = el("input", { type: "checkbox", value: d.key, "data-derived": d.key, title: `${d.description}: a live ORBIT.${d.fn} formula on each row` });
      box.addEventListener("change", () => {
        if (box.checked) chosenDerived.add(d.key);
        else chosenDerived.delete(d.key);
        refresh();
      });
      return el("li", {}, el("label", { class: "check", title: `${d.description}: a live ORBIT.${d.fn} formula on each row` }, box, d.label));
    });
    fieldList.appendChild(el("p", { class: "sub-title", id: "derived-title" }, "Computed in the sheet (live formulas)"));
    fieldList.appendChild(el("ul", { role: "group", "aria-labelledby": "derived-title" }, ...derivedItems));
  }

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
      bodies: allBodies.filter((b) => chosenBodies.has(b.name)).map((b) => b.name),
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
    const rows = plan.rows.map((r) =>
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
                  : el("td", {}, formatWith(v, plan.numberFormats[i])),
        ),
      ),
    );
    preview.appendChild(el("table", {}, el("thead", {}, head), el("tbody", {}, ...rows)));
  }

  function refresh(): void {
    plan = currentPlan();
    renderPreview();
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
