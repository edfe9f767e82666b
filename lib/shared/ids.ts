const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** True for a UUID; checked before an id from a URL reaches a uuid column (PostgreSQL would refuse it with an error). */
export const isUuid = (value: string): boolean => UUID.test(value);
