// Records keyed by names the user types (surface names). A name is plain text,
// so "__proto__" or "constructor" must be an ordinary key: `record[name] = value`
// would replace the object's prototype when name is "__proto__", and a plain read
// would find Object.prototype's members. Write with defineProperty, read own keys only.

/** Set `record[key] = value` as an own, enumerable property, whatever the key (mutates record). */
export function setOwn<T>(record: Record<string, T>, key: string, value: T): void {
  Object.defineProperty(record, key, { value, enumerable: true, writable: true, configurable: true });
}

/** The record's own value for key, or undefined (never an inherited member such as Object.prototype). */
export function ownValue<T>(record: Readonly<Record<string, T>> | undefined, key: string): T | undefined {
  return record !== undefined && Object.hasOwn(record, key) ? record[key] : undefined;
}

/** A shallow copy of the record with the same own keys ("__proto__" included, as a plain key). */
export function copyRecord<T>(record: Readonly<Record<string, T>> | undefined): Record<string, T> {
  const out: Record<string, T> = {};
  if (record) for (const key of Object.keys(record)) setOwn(out, key, record[key]);
  return out;
}
