import "server-only";
/** Cookie name alone, importable by proxy.ts without pulling in iron-session or the secret. */
export const SESSION_COOKIE = "glowbench_session";
