/**
 * Follows the host's theme: Office.context.officeTheme when the host gives one (its colours and
 * whether it is dark), else the system's prefers-color-scheme. Sets data-theme on <html> and the
 * host colours as CSS custom properties (through the CSSOM, which the page's CSP allows).
 */

export interface HostColours {
  bodyBackgroundColor?: string;
  bodyForegroundColor?: string;
  controlBackgroundColor?: string;
  controlForegroundColor?: string;
  isDarkTheme?: boolean;
}

/** Relative luminance (WCAG 2.x) of a #rgb or #rrggbb colour, null if it is not one. */
export function luminance(hex: string): number | null {
  const m = /^#?([0-9a-f]{3}|[0-9a-f]{6})$/i.exec(hex.trim());
  if (!m) return null;
  const h = m[1].length === 3 ? [...m[1]].map((c) => c + c).join("") : m[1];
  const [r, g, b] = [0, 2, 4].map((i) => parseInt(h.slice(i, i + 2), 16) / 255).map((c) => (c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4));
  return 0.2126 * r + 0.7152 * g + 0.0722 * b;
}

/** Dark when the host says so, else when its body background is darker than mid-grey; null if unknown. */
export function hostIsDark(t: HostColours | null | undefined): boolean | null {
  if (!t) return null;
  if (typeof t.isDarkTheme === "boolean") return t.isDarkTheme;
  const l = t.bodyBackgroundColor ? luminance(t.bodyBackgroundColor) : null;
  return l === null ? null : l < 0.18;
}

/** The host's theme colours, when running in an Office host that reports them. */
export function readHostTheme(): HostColours | null {
  try {
    const office = (globalThis as { Office?: typeof Office }).Office;
    return (office?.context?.officeTheme as HostColours | undefined) ?? null;
  } catch {
    return null;
  }
}

/** Applies the host theme, or the system preference when the host gives none. */
export function applyTheme(root: HTMLElement, host: HostColours | null, systemDark: boolean): "dark" | "light" {
  const dark = hostIsDark(host) ?? systemDark;
  root.dataset.theme = dark ? "dark" : "light";
  const vars: [string, string | undefined][] = [
    ["--host-bg", host?.bodyBackgroundColor],
    ["--host-fg", host?.bodyForegroundColor],
    ["--host-control-bg", host?.controlBackgroundColor],
    ["--host-control-fg", host?.controlForegroundColor],
  ];
  for (const [name, value] of vars) {
    if (value && luminance(value) !== null) root.style.setProperty(name, value.startsWith("#") ? value : `#${value}`);
    else root.style.removeProperty(name);
  }
  return dark ? "dark" : "light";
}
