/** Modules the workbench's build provides (scripts/build-web.mjs). */
declare module "*?raw" {
  const text: string;
  export default text;
}

/** The worker script's source, bundled into the page so that workers start from a Blob URL. */
declare module "virtual:worker-source" {
  const source: string;
  export default source;
}
