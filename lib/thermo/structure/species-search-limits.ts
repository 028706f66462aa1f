// Bounds of a species search, shared by the index and the request schema (which must not load the index).
export const MAX_QUERY_LENGTH = 100;
