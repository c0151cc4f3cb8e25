/** Rows per page of the /jobs screen (the API defaults to 50 for other callers). Kept apart from the zod schemas so the list's client code can read it without them. */
export const JOB_LIST_PAGE_SIZE = 25;
