/** The "Sheet templates" panel: one card per template, each inserting a new sheet of live formulas. */
import { insertTemplate } from "../excel";
import { missingFunctions, templateFunctions, TEMPLATES } from "../templates";
import { byId, el } from "./dom";
import { at, showError, showMessage, showOutcome } from "./status";

export interface TemplatesView {
  setEnabled(on: boolean): void;
  status: HTMLElement;
}

/** `available`: ids of the worksheet functions in this build; a template needing others is shown but not offered. */
export function mountTemplates(available: ReadonlySet<string>): TemplatesView {
  const list = byId("template-list");
  const status = byId("templates-status");
  const buttons: HTMLButtonElement[] = [];
  for (const t of TEMPLATES) {
    const uses = templateFunctions(t);
    const missing = missingFunctions(t, available);
    const titleId = `template-${t.id}`;
    const button = el("button", { type: "button", class: "primary", "data-template": t.id, "aria-describedby": titleId, disabled: true }, "Insert sheet");
    button.addEventListener("click", async () => {
      buttons.forEach((b) => (b.disabled = true));
      showMessage(status, "info", `Adding the sheet “${t.sheetName}”…`);
      try {
        const o = await insertTemplate(t);
        showOutcome(status, o, {
          verb: "Insert",
          retry: () => button.click(),
          done: (w) => `Added ${at(w.sheet, w.address)}: ${t.title.toLowerCase()}, as live formulas. The first input is selected.`,
        });
      } catch (e) {
        showError(status, e);
      } finally {
        buttons.forEach((b) => (b.disabled = !enabledNow));
      }
    });
    if (missing.length === 0) buttons.push(button);
    list.appendChild(
      el(
        "li",
        { class: "card" },
        el("h3", { id: titleId }, t.title),
        el("p", {}, t.summary),
        el("p", { class: "uses" }, "Uses ", ...uses.flatMap((u, i) => [i > 0 ? ", " : "", el("code", {}, u)])),
        missing.length === 0 ? button : el("p", { class: "unavailable", "data-unavailable": t.id }, `Not in this build yet: it needs ${missing.join(", ")}.`),
      ),
    );
  }
  let enabledNow = false;
  return {
    status,
    setEnabled(on: boolean) {
      enabledNow = on;
      buttons.forEach((b) => (b.disabled = !on));
    },
  };
}
