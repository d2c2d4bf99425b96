/** The "Function guide" panel: every worksheet function, searchable, with an example to put in a cell. */
import { insertFormula, type Target } from "../excel";
import { byFamily, searchGuide, splitFirstSentence, type GuideEntry } from "../guide";
import { byId, el } from "./dom";
import { at, showError, showMessage, showOutcome, type Where } from "./status";

export interface GuideView {
  setEnabled(on: boolean): void;
}

export function mountGuide(entries: readonly GuideEntry[]): GuideView {
  const search = byId<HTMLInputElement>("guide-search");
  const list = byId("guide-list");
  const count = byId("guide-count");
  const buttons: HTMLButtonElement[] = [];
  let enabled = false;

  const items = new Map<string, HTMLElement>();
  for (const e of entries) {
    const status = el("div", { class: "status", role: "status", "aria-live": "polite" });
    const button = el("button", { type: "button", class: "small", "data-insert": e.id, disabled: true }, "Put in selected cell");
    const put = async (where: Target | "selection") => {
      if (!e.example) return;
      button.disabled = true;
      showMessage(status, "info", "Checking the cell…");
      try {
        const o = await insertFormula(e.example, where, e.spill ?? undefined);
        showOutcome(status, o, {
          verb: "Put it",
          retry: (w: Where) => {
            if (!("newSheet" in w)) void put(w);
          },
          done: (w) => `Wrote ${e.id} in ${at(w.sheet, w.address.split(":")[0])}${e.spill && (e.spill.rows > 1 || e.spill.cols > 1) ? `; its result fills ${w.address}` : ""}. Edit its arguments there.`,
        });
      } catch (err) {
        showError(status, err);
      } finally {
        button.disabled = !enabled || !e.example;
      }
    };
    button.addEventListener("click", () => void put("selection"));
    if (e.example) buttons.push(button);

    const [first, rest] = splitFirstSentence(e.description);
    const params = e.parameters.length
      ? el(
          "dl",
          {},
          ...e.parameters.flatMap((p) => [el("dt", {}, p.name, p.optional ? el("span", { class: "opt" }, " (optional)") : null), el("dd", {}, p.description)]),
        )
      : el("p", { class: "muted" }, "No parameters.");
    const body = el(
      "div",
      { class: "guide-body" },
      el("code", { class: "formula", "aria-label": "Signature" }, `=ORBIT.${e.signature}`),
      rest ? el("p", { class: "more" }, rest) : null,
      e.returns ? el("p", { class: "returns" }, el("span", { class: "muted" }, "Returns "), e.returns) : null,
      e.columns.length ? el("p", { class: "columns" }, el("span", { class: "muted" }, "Columns "), e.columns.join(" · ")) : null,
      params,
      e.example ? el("div", {}, el("p", { class: "muted" }, "Example"), el("code", { class: "formula", "data-example": e.id }, e.example)) : el("p", { class: "muted" }, "No worked example yet."),
      e.example ? el("div", { class: "actions" }, button) : null,
      status,
    );
    const item = el(
      "li",
      { "data-function": e.id },
      el("details", {}, el("summary", {}, el("span", { class: "fn" }, e.id), el("span", { class: "desc" }, first)), body),
    );
    items.set(e.id, item);
  }

  // Without a query the list is grouped by family under headings; a query lists the matches best first.
  const headings = new Map<string, HTMLElement>();
  for (const g of byFamily(entries)) headings.set(g.family, el("li", { class: "family", role: "presentation" }, el("h3", {}, g.family || "Other")));

  const apply = () => {
    const hits = searchGuide(entries, search.value);
    const shown = new Set(hits.map((h) => h.id));
    for (const [id, li] of items) li.hidden = !shown.has(id);
    const grouped = search.value.trim() === "";
    for (const h of headings.values()) h.hidden = !grouped;
    if (grouped)
      for (const g of byFamily(entries)) {
        list.appendChild(headings.get(g.family)!);
        for (const e of g.entries) list.appendChild(items.get(e.id)!);
      }
    else for (const h of hits) list.appendChild(items.get(h.id)!);
    count.textContent =
      hits.length === entries.length ? `${entries.length} functions. Open one for its parameters and an example.` : hits.length === 0 ? "No function matches." : `${hits.length} of ${entries.length} functions match.`;
  };
  search.addEventListener("input", apply);
  apply();

  return {
    setEnabled(on: boolean) {
      enabled = on;
      buttons.forEach((b) => (b.disabled = !on));
    },
  };
}
