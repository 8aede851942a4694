/** The export formats, in a module of their own: the command line's `--format` help names them. */
export const EXPORT_FORMATS = ["svg", "dxf", "csv", "json"] as const;
export type ExportFormat = (typeof EXPORT_FORMATS)[number];
