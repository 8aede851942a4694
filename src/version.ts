/** The package version, printed by `--version` and written into reports. */
export const VERSION = "0.1.0";
