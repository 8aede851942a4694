/**
 * What the export files are called and which date they carry. Pure: both shells (the CLI and the
 * browser workbench) name and date their files here, so the same scenario gives the same bytes.
 */

/**
 * The extension of the last path segment, as Node's `path.posix.extname` gives it: ".yaml" of
 * "dir/tie.yaml", "" of ".yaml" or "tie".
 */
export function fileExtension(path: string): string {
  let startDot = -1;
  let startPart = 0;
  let end = -1;
  let matchedSlash = true;
  // 0: no dot seen before the last one; 1: a dot right before; -1: other characters before it.
  let preDotState = 0;
  for (let i = path.length - 1; i >= 0; --i) {
    const ch = path[i];
    if (ch === "/") {
      if (!matchedSlash) {
        startPart = i + 1;
        break;
      }
      continue;
    }
    if (end === -1) {
      matchedSlash = false;
      end = i + 1;
    }
    if (ch === ".") {
      if (startDot === -1) startDot = i;
      else if (preDotState !== 1) preDotState = 1;
    } else if (startDot !== -1) {
      preDotState = -1;
    }
  }
  if (startDot === -1 || end === -1 || preDotState === 0 || (preDotState === 1 && startDot === end - 1 && startDot === startPart + 1)) return "";
  return path.slice(startDot, end);
}

/** The last path segment without its extension, as `basename(p, extname(p))` in Node (POSIX). */
export function fileStem(path: string): string {
  const trimmed = path.replace(/\/+$/, "");
  const segment = trimmed.slice(trimmed.lastIndexOf("/") + 1);
  const ext = fileExtension(segment);
  return ext && segment !== ext && segment.endsWith(ext) ? segment.slice(0, -ext.length) : segment;
}

/** Base of the export file names: the scenario file's stem, with "-rankN" for a search result. */
export function exportBase(scenarioFile: string, rank?: number): string {
  return fileStem(scenarioFile) + (rank !== undefined ? `-rank${rank}` : "");
}

/**
 * The date on drawings and reports (ISO, yyyy-mm-dd): the one SOURCE_DATE_EPOCH names when it is a
 * whole number of seconds (reproducible output, common practice), else today's.
 */
export function exportDate(sourceDateEpoch: string | undefined, now: Date): string {
  const d = sourceDateEpoch && /^\d+$/.test(sourceDateEpoch) ? new Date(Number(sourceDateEpoch) * 1000) : now;
  return d.toISOString().slice(0, 10);
}
