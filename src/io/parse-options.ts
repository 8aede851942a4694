/**
 * How every file schema is run: without zod's generated fast path for objects (`new Function`). A
 * command parses a file once, and generating that path costs more than it saves there (node 20: the
 * first parse of a demo scenario about 3 ms this way, 6–15 ms with the generated path). Where a page's
 * content-security policy forbids eval, zod takes this path by itself. Results and messages are the
 * same on both paths.
 */
export const PARSE_OPTIONS = { jitless: true } as const;
