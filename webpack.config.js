/* Build: dist/functions.js + dist/functions.json (from the JSDoc, by custom-functions-metadata's
   plugin), the pane, the manifest and the function reference page. Development URLs are
   https://localhost:3000; set ADDIN_BASE_URL at build time to host the built files elsewhere. */
const fs = require("fs");
const path = require("path");
const CustomFunctionsMetadataPlugin = require("custom-functions-metadata-plugin");
const HtmlWebpackPlugin = require("html-webpack-plugin");
const CopyWebpackPlugin = require("copy-webpack-plugin");
const { sources, Compilation } = require("webpack");
const { referencePage, guideMetadata } = require("./scripts/reference.cjs");
const { withCustomEnums } = require("./scripts/custom-enums.cjs");

const DEV_URL = "https://localhost:3000";
const baseUrl = (process.env.ADDIN_BASE_URL || DEV_URL).replace(/\/+$/, "");

// Every file in src/functions that declares worksheet functions is an input of the metadata
// generator (which appends its CustomFunctions.associate calls) and part of the functions bundle.
const functionsDir = path.resolve(__dirname, "src/functions");
const familyFiles = fs
  .readdirSync(functionsDir)
  .filter((f) => f.endsWith(".ts"))
  .map((f) => path.join(functionsDir, f))
  .filter((f) => fs.readFileSync(f, "utf8").includes("@customfunction"))
  .sort();

/** Rewrites the development URL in text assets and adds the reference page built from functions.json. */
class AddinUrlsPlugin {
  apply(compiler) {
    compiler.hooks.thisCompilation.tap("AddinUrlsPlugin", (compilation) => {
      compilation.hooks.processAssets.tap({ name: "AddinUrlsPlugin", stage: Compilation.PROCESS_ASSETS_STAGE_SUMMARIZE }, (assets) => {
        for (const name of Object.keys(assets)) {
          if (!/\.(xml|json|html)$/.test(name)) continue;
          const text = assets[name].source().toString();
          if (baseUrl !== DEV_URL && text.includes(DEV_URL)) compilation.updateAsset(name, new sources.RawSource(text.split(DEV_URL).join(baseUrl)));
        }
        const meta = compilation.getAsset("functions.json");
        if (meta) compilation.emitAsset("reference.html", new sources.RawSource(referencePage(JSON.parse(meta.source.source().toString()))));
      });
    });
  }
}

/**
 * Writes the AutoComplete suggestions each parameter's reader records into functions.json as
 * Excel custom enums (scripts/custom-enums.cjs), from the functions.js just built, once it is final.
 */
class CustomEnumsPlugin {
  apply(compiler) {
    compiler.hooks.thisCompilation.tap("CustomEnumsPlugin", (compilation) => {
      compilation.hooks.processAssets.tap({ name: "CustomEnumsPlugin", stage: Compilation.PROCESS_ASSETS_STAGE_SUMMARIZE }, () => {
        const meta = compilation.getAsset("functions.json");
        const code = compilation.getAsset("functions.js");
        if (!meta || !code) return;
        const json = withCustomEnums(JSON.parse(meta.source.source().toString()), code.source.source().toString());
        compilation.updateAsset("functions.json", new sources.RawSource(JSON.stringify(json, null, 4)));
      });
    });
  }
}

// Two builds in one run: the functions (and functions.json) first, then the pane, which bundles
// the functions.json the first build emitted (the "dependencies" entry orders them).
module.exports = (_env, argv) => {
  const production = argv.mode === "production";
  const dist = path.resolve(__dirname, "dist");
  const common = {
    devtool: production ? false : "source-map",
    target: ["web", "es2020"],
    resolve: { extensions: [".ts", ".js"] },
    performance: { hints: false },
  };
  const tsRule = { test: /\.ts$/, exclude: /node_modules/, use: { loader: "ts-loader", options: { onlyCompileBundledFiles: true } } };
  const functions = {
    ...common,
    name: "functions",
    entry: { functions: familyFiles },
    // The pane build writes taskpane.* into the same folder after this one; keep them on rebuilds.
    output: { path: dist, filename: "[name].js", clean: { keep: /^taskpane\.(html|js|css)$/ } },
    module: { rules: [tsRule] },
    plugins: [
      new CustomFunctionsMetadataPlugin({ output: "functions.json", input: familyFiles }),
      new CustomEnumsPlugin(),
      new CopyWebpackPlugin({ patterns: [{ from: "assets/*.{png,svg}", to: "assets/[name][ext]" }, { from: "manifest.xml", to: "manifest.xml" }] }),
      new AddinUrlsPlugin(),
    ],
    devServer: {
      static: { directory: dist },
      headers: { "Access-Control-Allow-Origin": "*" },
      port: 3000,
      server: { type: "https", options: production ? {} : devCerts() },
    },
  };
  const taskpane = {
    ...common,
    name: "taskpane",
    dependencies: ["functions"],
    entry: { taskpane: "./src/taskpane/taskpane.ts" },
    output: { path: dist, filename: "[name].js", clean: false },
    resolve: { ...common.resolve, alias: { "orbit-functions-metadata$": path.join(dist, "functions.json") } },
    module: { rules: [tsRule, { test: /functions\.json$/, include: dist, type: "json", parser: { parse: guideMetadata } }] },
    plugins: [
      // The page loads functions.js itself (shared runtime), so only the pane's own chunk is injected.
      new HtmlWebpackPlugin({ filename: "taskpane.html", template: "./src/taskpane/taskpane.html", chunks: ["taskpane"], inject: "body", scriptLoading: "defer" }),
      new CopyWebpackPlugin({ patterns: [{ from: "src/taskpane/taskpane.css", to: "taskpane.css" }] }),
      new AddinUrlsPlugin(),
    ],
  };
  return [functions, taskpane];
};

/** office-addin-dev-certs' localhost certificate, when installed (npx office-addin-dev-certs install). */
function devCerts() {
  const dir = path.join(require("os").homedir(), ".office-addin-dev-certs");
  const files = { ca: "ca.crt", key: "localhost.key", cert: "localhost.crt" };
  if (!fs.existsSync(path.join(dir, files.cert))) return {};
  return Object.fromEntries(Object.entries(files).map(([k, f]) => [k, fs.readFileSync(path.join(dir, f))]));
}
