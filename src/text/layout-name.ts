/**
 * The name of a scenario once its layout is chosen: a search scenario's "(layout to be found)" is
 * dropped, the layout being found (drawings, saved scenarios and the sheets made from them).
 */
export function foundLayoutName(name: string): string {
  return name.replace(/\s*\(layout to be found\)\s*/gi, " ").trim();
}
