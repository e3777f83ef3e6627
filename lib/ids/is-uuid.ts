// Pure: ids from URLs, tokens and forms are checked before they reach a uuid column (PostgreSQL would
// answer a malformed one with an error, not with "not found").
const UUID_PATTERN = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** Whether the text is a UUID in its usual hyphenated form, any case. */
export const isUuid = (value: string): boolean => UUID_PATTERN.test(value);
