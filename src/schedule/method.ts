/** The methods that choose a schedule's bolt types, in a module of their own: the `--method` help names them. */
export type Method = "enumeration" | "integer programme";
export type MethodRequest = "auto" | "enumerate" | "mip";
export const METHOD_REQUESTS: readonly MethodRequest[] = ["auto", "enumerate", "mip"];
