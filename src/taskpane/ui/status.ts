/** Reports what an insertion did, and when it refused, the free places it can use instead. */
import { cellAddress, quoteSheet } from "../cells";
import type { Outcome, Target } from "../excel";
import { append, clear, el } from "./dom";

export type Where = Target | { newSheet: string };

export interface OutcomeOptions {
  /** Sentence for a success, e.g. "Inserted table OrbitBodies at Sheet1!B2:H12." */
  done: (o: Extract<Outcome, { ok: true }>) => string;
  /** Runs the same insertion at another place. */
  retry: (where: Where) => void;
  /** Offer a new sheet (with this name) as well as the free blocks. */
  newSheet?: string;
  /** Verb for the offer buttons: "Insert" or "Put it". */
  verb: string;
}

export const at = (sheet: string, address: string): string => `${quoteSheet(sheet)}!${address}`;

export function showMessage(box: HTMLElement, kind: "ok" | "warn" | "err" | "info", text: string): HTMLElement {
  clear(box);
  const msg = el("div", { class: `msg ${kind}` }, el("p", {}, text));
  box.appendChild(msg);
  return msg;
}

export function showOutcome(box: HTMLElement, o: Outcome, opts: OutcomeOptions): void {
  if (o.ok) {
    showMessage(box, "ok", opts.done(o));
    return;
  }
  const text =
    o.reason === "occupied"
      ? `Nothing was written. ${at(o.sheet, o.address)} is not empty: ${o.filledCount === 1 ? "1 cell holds" : `${o.filledCount} cells hold`} data, the first at ${o.firstFilled}.`
      : `Nothing was written: from ${at(o.sheet, o.address)} it would run past the edge of the sheet.`;
  const msg = showMessage(box, "warn", text);
  const offer = (label: string, where: Where) => {
    const b = el("button", { type: "button", class: "small" }, label);
    b.addEventListener("click", () => opts.retry(where));
    return b;
  };
  const buttons: HTMLButtonElement[] = [];
  if (o.right) buttons.push(offer(`${opts.verb} at ${cellAddress(o.right.row, o.right.col)} (right)`, o.right));
  if (o.below) buttons.push(offer(`${opts.verb} at ${cellAddress(o.below.row, o.below.col)} (below)`, o.below));
  if (opts.newSheet) buttons.push(offer(`${opts.verb} on a new sheet`, { newSheet: opts.newSheet }));
  if (buttons.length > 0) {
    append(msg, el("p", { class: "muted" }, "Free space of the same size:"), el("div", { class: "offers" }, ...buttons));
    buttons[0].focus();
  }
}

/** An error from Excel (or no Excel at all), in plain words. */
export function showError(box: HTMLElement, e: unknown): void {
  const text = e instanceof Error ? e.message : String(e);
  showMessage(box, "err", `Excel could not do it: ${text}`);
}
