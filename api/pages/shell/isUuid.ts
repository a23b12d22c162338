const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** Path ids are checked before they reach the database, which would refuse them less kindly. */
export function isUuid(value: string | undefined): value is string {
  return typeof value === 'string' && UUID.test(value);
}
