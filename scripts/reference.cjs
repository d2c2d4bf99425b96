/* The function reference, generated from the built functions.json (never typed by hand), grouped
   by the family each function's source file declares (`family("...")`). Used by the build for
   dist/reference.html and by scripts/function-reference.ts for the README. */
const fs = require("fs");
const path = require("path");

const functionsDir = path.resolve(__dirname, "../src/functions");

/** id -> { family title, @returns text }, read from the family files (functions.json keeps no @returns text). */
function sourceFacts() {
  const out = new Map();
  for (const f of fs.readdirSync(functionsDir).filter((x) => x.endsWith(".ts")).sort()) {
    const text = fs.readFileSync(path.join(functionsDir, f), "utf8");
    const fam = /\bfamily\("([^"]+)"\)/.exec(text);
    for (const block of text.match(/\/\*\*[\s\S]*?\*\//g) || []) {
      const id = /@customfunction\s+([A-Z0-9_.]+)/.exec(block);
      if (!id) continue;
      const ret = /@returns\s+([\s\S]*?)(?=\n\s*\*\s*@|\*\/)/.exec(block);
      out.set(id[1], { family: fam ? fam[1] : "Other", returns: ret ? ret[1].replace(/\s*\n\s*\*\s*/g, " ").trim() : "" });
    }
  }
  return out;
}

function grouped(meta) {
  const facts = sourceFacts();
  const groups = new Map();
  for (const fn0 of meta.functions) {
    const fact = facts.get(fn0.id) || { family: "Other", returns: "" };
    const fn = { ...fn0, returns: fact.returns };
    const g = fact.family;
    if (!groups.has(g)) groups.set(g, []);
    groups.get(g).push(fn);
  }
  return groups;
}

const signature = (fn) =>
  `${fn.name}(${(fn.parameters || []).map((p) => (p.optional ? `[${p.name}]` : p.name)).join(", ")})`;

function referenceMarkdown(meta) {
  const lines = [];
  for (const [g, fns] of grouped(meta)) {
    lines.push(`#### ${g}`, "", "| Function | What it gives | Parameters |", "|---|---|---|");
    for (const fn of fns) {
      const params = (fn.parameters || []).map((p) => `\`${p.name}\`${p.optional ? " (optional)" : ""}: ${p.description || ""}`).join("<br>");
      const result = fn.returns ? ` Returns: ${fn.returns}` : "";
      lines.push(`| \`=ORBIT.${signature(fn)}\` | ${(fn.description || "").replace(/\|/g, "\\|")}${result.replace(/\|/g, "\\|")} | ${params.replace(/\|/g, "\\|")} |`);
    }
    lines.push("");
  }
  return lines.join("\n");
}

const esc = (s) => String(s).replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;");

function referencePage(meta) {
  const body = [];
  const toc = [];
  for (const [g, fns] of grouped(meta)) {
    toc.push(`<li>${esc(g)}: ${fns.map((fn) => `<a href="#${fn.id.toLowerCase()}">${esc(fn.name)}</a>`).join(", ")}</li>`);
    body.push(`<h2>${esc(g)}</h2>`);
    for (const fn of fns) {
      body.push(`<section id="${fn.id.toLowerCase()}"><h3><code>=ORBIT.${esc(signature(fn))}</code></h3><p>${esc(fn.description || "")}</p><dl>`);
      for (const p of fn.parameters || []) body.push(`<dt><code>${esc(p.name)}</code>${p.optional ? " (optional)" : ""}</dt><dd>${esc(p.description || "")}</dd>`);
      if (fn.returns) body.push(`<dt>Returns</dt><dd>${esc(fn.returns)}</dd>`);
      body.push(`</dl></section>`);
    }
  }
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<meta http-equiv="Content-Security-Policy" content="default-src 'none'; style-src 'unsafe-inline'">
<title>Orbit Cells function reference</title>
<style>body{font:15px/1.5 system-ui,sans-serif;max-width:56rem;margin:2rem auto;padding:0 1rem;color:#1b1f24}code{font:13px ui-monospace,monospace}
section{border-top:1px solid #d0d7de;padding:.4rem 0}dt{font-weight:600;margin-top:.3rem}dd{margin-left:1.2rem}
@media (prefers-color-scheme: dark){body{background:#16181d;color:#e6e8eb}section{border-color:#3a3f47}a{color:#8cb4ff}}</style></head>
<body><h1>Orbit Cells function reference</h1>
<p>All functions live in the <code>ORBIT</code> namespace. Units: km, km/s, s, kg, degrees; GM in km³/s²; dates are Excel date serials (UTC).
Results are preliminary two-body and first-order analyses, not for flight operations or safety decisions.</p>
<ul>${toc.join("")}</ul>${body.join("\n")}</body></html>`;
}

/** The part of functions.json the pane's function guide shows (bundled into the pane, never fetched), with each @returns text. */
function guideMetadata(text) {
  const facts = sourceFacts();
  return {
    functions: JSON.parse(text).functions.map((f) => ({
      id: f.id,
      description: f.description,
      returns: facts.get(f.id)?.returns ?? "",
      parameters: f.parameters.map((p) => ({ name: p.name, description: p.description, optional: p.optional })),
    })),
  };
}

module.exports = { referenceMarkdown, referencePage, grouped, signature, guideMetadata };
