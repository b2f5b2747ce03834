/**
 * How much one recipe may hold, for the server's schemas and the client's forms alike. Kept apart
 * from shared/schemas so a form can show the limit without loading zod on a first visit.
 */
export const MAX_LINES = 100;
export const MAX_TEXT_CHARS = 20_000;
