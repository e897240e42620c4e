/**
 * The version of the JSON the tool prints (`check --json`, `resize --json`, results.json,
 * `materials --json`, the error object). Raised when a key is renamed or removed or its meaning
 * changes; adding a key does not raise it.
 */
export const SCHEMA_VERSION = 2;
