/**
 * Scenario file or project file: a file of the other kind is refused with one line that says which it
 * is and which command reads it, before its fields are read as the wrong kind's.
 */
import { InputError } from "./input-error.js";

/** A project file (a list of splices) given where one scenario is read. */
export function refuseProjectAsScenario(file: Record<string, unknown>): void {
  if ("splices" in file && !("plates" in file)) {
    throw new InputError("splices", "unknown field — this is a project file (a list of splices); `check`, `search`, `compare`, `export` and `report` read one scenario; a project goes to `splicewright schedule`");
  }
}

/** A scenario file (one splice) given where a project is read. */
export function refuseScenarioAsProject(file: Record<string, unknown>): void {
  if (!("splices" in file) && ("plates" in file || "layout" in file)) {
    throw new InputError("splices", "required — this is a scenario file (one splice); `schedule` reads a project file listing its splices under `splices:` (README, \"The project file\"); one scenario goes to `check` or `search`");
  }
}
