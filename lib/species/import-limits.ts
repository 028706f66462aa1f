// Limits of one species CSV import; shared by the upload check in the browser and the server.
export const MAX_IMPORT_BYTES = 2 * 1024 * 1024;
export const MAX_IMPORT_ROWS = 5000;
