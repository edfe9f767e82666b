const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** True for a UUID; checked before an id from a URL reaches a uuid column (PostgreSQL would refuse anything else with an error, not "not found"). */
export const isUuid = (value: unknown): value is string => typeof value === "string" && UUID.test(value);
