// Stands in for the "server-only" marker under vitest. Next.js resolves "server-only" itself (an empty module
// on the server, an error in a client bundle); vitest runs only on the server, so the marker has nothing to do.
export {};
