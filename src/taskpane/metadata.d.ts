/**
 * The generated dist/functions.json, bundled into the pane at build time (webpack resolves this
 * name to the file the functions build emits, keeping only what the guide shows), so the pane
 * never fetches it.
 */
declare module "orbit-functions-metadata" {
  const metadata: {
    functions: { id: string; description?: string; returns?: string; parameters: { name: string; description?: string; optional?: boolean }[] }[];
  };
  export default metadata;
}
