/**
 * A multi-select list with one tab stop: the ARIA listbox pattern (aria-multiselectable, options
 * with aria-selected) with a roving tabindex. Arrow keys move (Up/Down by rows of the grid the
 * options are laid out in, Left/Right in reading order), Home/End jump, Space picks or drops the
 * option in focus, Ctrl+A (Cmd+A) picks every option shown, and a letter jumps to the next
 * option starting with it. A click picks or drops too.
 */
import { el } from "./dom";

export interface PickOption {
  key: string;
  label: string;
  /** Attribute naming the option for code and tests, e.g. "data-body", with `value` (default: key). */
  attribute: string;
  value?: string;
  title?: string;
  selected: boolean;
}

export interface PickGroup {
  /** Shown above the group and read as its name; omit for options without a heading. */
  title?: string;
  options: PickOption[];
}

export interface PickList {
  /** Picks exactly these keys. */
  setSelected(keys: ReadonlySet<string>): void;
  /** Hides options whose key fails the test (a filter); hidden options are skipped by the keys. */
  show(visible: (key: string) => boolean): number;
  /** The option element of a key. */
  option(key: string): HTMLElement | undefined;
}

let lists = 0;

/** Fills `list` (which gets role="listbox") with the groups; `changed` hears every pick and drop. */
export function mountPickList(list: HTMLElement, groups: readonly PickGroup[], changed: (key: string, selected: boolean) => void): PickList {
  const id = `pick-${++lists}`;
  list.setAttribute("role", "listbox");
  list.setAttribute("aria-multiselectable", "true");
  const options: HTMLElement[] = [];
  const byKey = new Map<string, HTMLElement>();

  groups.forEach((g, gi) => {
    const items = g.options.map((o) => {
      const li = el(
        "li",
        { role: "option", id: `${id}-${options.length}`, class: "opt", tabindex: -1, "aria-selected": String(o.selected), [o.attribute]: o.value ?? o.key, title: o.title },
        el("span", { class: "box", "aria-hidden": "true" }),
        o.label,
      );
      li.dataset.key = o.key;
      options.push(li);
      byKey.set(o.key, li);
      return li;
    });
    if (g.title) {
      const titleId = `${id}-g${gi}`;
      // The heading names the group for assistive technology through aria-labelledby; it is not
      // itself an item of the list.
      list.appendChild(
        el("div", { class: "pick-group", role: "presentation" }, el("div", { class: "pick-group-title", id: titleId, "aria-hidden": "true" }, g.title), el("ul", { role: "group", "aria-labelledby": titleId }, ...items)),
      );
    } else list.appendChild(el("ul", { class: "pick-plain", role: "presentation" }, ...items));
  });

  const visible = () => options.filter((o) => !o.hidden && !(o.closest(".pick-group") as HTMLElement | null)?.hidden);
  let current: HTMLElement | undefined = options[0];

  /** Exactly one shown option is in the tab order; with none shown, the list itself is. */
  const settle = () => {
    const shown = visible();
    if (!current || !shown.includes(current)) current = shown[0];
    for (const o of options) o.tabIndex = o === current ? 0 : -1;
    if (current) list.removeAttribute("tabindex");
    else list.tabIndex = 0;
  };
  const moveTo = (o: HTMLElement | undefined) => {
    if (!o) return;
    current = o;
    settle();
    o.focus();
  };
  const toggle = (o: HTMLElement) => {
    const on = o.getAttribute("aria-selected") !== "true";
    o.setAttribute("aria-selected", String(on));
    changed(o.dataset.key!, on);
  };

  /** The shown option on the next row up or down whose centre is nearest in x. */
  const vertical = (from: HTMLElement, down: boolean): HTMLElement | undefined => {
    const r = from.getBoundingClientRect();
    const cx = r.left + r.width / 2;
    const others = visible()
      .map((o) => ({ o, b: o.getBoundingClientRect() }))
      .filter(({ b }) => (down ? b.top >= r.bottom - 2 : b.bottom <= r.top + 2));
    if (others.length === 0) return undefined;
    const rowTop = down ? Math.min(...others.map((x) => x.b.top)) : Math.max(...others.map((x) => x.b.top));
    const row = others.filter((x) => Math.abs(x.b.top - rowTop) < 4);
    row.sort((a, b) => Math.abs(a.b.left + a.b.width / 2 - cx) - Math.abs(b.b.left + b.b.width / 2 - cx));
    return row[0].o;
  };

  list.addEventListener("keydown", (ev) => {
    const shown = visible();
    const at = current ? shown.indexOf(current) : -1;
    const focused = document.activeElement instanceof HTMLElement && options.includes(document.activeElement) ? document.activeElement : current;
    let handled = true;
    if (ev.key === "ArrowDown") moveTo(focused ? vertical(focused, true) : shown[0]);
    else if (ev.key === "ArrowUp") moveTo(focused ? vertical(focused, false) : shown[0]);
    else if (ev.key === "ArrowRight") moveTo(shown[Math.min(shown.length - 1, at + 1)]);
    else if (ev.key === "ArrowLeft") moveTo(shown[Math.max(0, at - 1)]);
    else if (ev.key === "Home") moveTo(shown[0]);
    else if (ev.key === "End") moveTo(shown[shown.length - 1]);
    else if (ev.key === " " || ev.key === "Spacebar") {
      if (focused) toggle(focused);
    } else if ((ev.ctrlKey || ev.metaKey) && ev.key.toLowerCase() === "a") {
      for (const o of shown) if (o.getAttribute("aria-selected") !== "true") toggle(o);
    } else if (ev.key.length === 1 && /\S/.test(ev.key) && !ev.ctrlKey && !ev.metaKey && !ev.altKey) {
      const k = ev.key.toLowerCase();
      const order = [...shown.slice(at + 1), ...shown.slice(0, at + 1)];
      moveTo(order.find((o) => (o.textContent ?? "").trim().toLowerCase().startsWith(k)));
    } else handled = false;
    if (handled) ev.preventDefault();
  });
  list.addEventListener("click", (ev) => {
    const o = (ev.target as HTMLElement).closest<HTMLElement>('[role="option"]');
    if (!o || !options.includes(o)) return;
    toggle(o);
    moveTo(o);
  });
  settle();

  return {
    setSelected(keys) {
      for (const o of options) o.setAttribute("aria-selected", String(keys.has(o.dataset.key!)));
    },
    show(isVisible) {
      let n = 0;
      for (const o of options) {
        o.hidden = !isVisible(o.dataset.key!);
        if (!o.hidden) n++;
      }
      list.querySelectorAll<HTMLElement>(".pick-group").forEach((g) => (g.hidden = [...g.querySelectorAll<HTMLElement>('[role="option"]')].every((o) => o.hidden)));
      settle();
      return n;
    },
    option: (key) => byKey.get(key),
  };
}
