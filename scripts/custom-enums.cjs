/* Excel custom enums (AutoComplete suggestions) for functions.json, generated from the registry the
   built functions bundle publishes. custom-functions-metadata turns a TypeScript enum tagged
   @customenum into an "enums" entry only when the enum is declared in the same file as every
   function using it, so the suggestions are not declared per file: each parameter's reader
   records its words (FunctionSpec.choices, src/functions/params.ts), and this step writes them
   as the metadata's "enums" and each parameter's "customEnumId", in the form the generator itself
   gives an enum parameter (type "string", the parameter's dimensionality kept). Excel versions
   without custom enums take such a parameter as a plain one, without suggestions. */
const vm = require("vm");

/** The registry (OrbitCellsRegistry) of a built functions.js, run in a context of its own with a CustomFunctions stand-in. */
function registryOf(code) {
  class CellError {
    constructor(code, message) {
      this.code = code;
      this.message = message;
    }
  }
  const CustomFunctions = { associate() {}, Error: CellError, ErrorCode: {} };
  const context = { CustomFunctions };
  vm.runInNewContext(code, context, { filename: "functions.js" });
  const registry = context.OrbitCellsRegistry;
  if (!registry) throw new Error("functions.js published no OrbitCellsRegistry");
  return registry;
}

/** An enum id from a parameter name: letters, digits and underscores, starting with a letter (the generator's rule). */
const idOf = (name) => name.toUpperCase().replace(/[^A-Z0-9_]/g, "_");

/**
 * functions.json with "enums" and each suggesting parameter's "customEnumId". One enum per distinct
 * word list, named after the first parameter that uses it (the function id is put in front when
 * another list already has that name), so the output is the same for the same bundle.
 */
function withCustomEnums(metadata, code) {
  const specs = registryOf(code).specs;
  const enums = [];
  const byList = new Map();
  const functions = metadata.functions.map((f) => {
    const spec = specs.get(f.id);
    if (!spec) return f;
    const parameters = f.parameters.map((p) => {
      const choices = spec.choices[p.name];
      if (!choices || choices.length === 0) return p;
      const key = JSON.stringify(choices);
      let id = byList.get(key);
      if (!id) {
        id = enums.some((e) => e.id === idOf(p.name)) ? idOf(`${f.id}_${p.name}`) : idOf(p.name);
        byList.set(key, id);
        enums.push({ id, type: "string", values: choices.map((c) => ({ name: c.value, stringValue: c.value, tooltip: c.tooltip })) });
      }
      return { ...p, type: "string", customEnumId: id };
    });
    return { ...f, parameters };
  });
  return enums.length === 0 ? { ...metadata, functions } : { ...metadata, functions, enums };
}

module.exports = { withCustomEnums, registryOf };
