/**
 * A deep copy as plain JSON: class instances from the validation pipe become plain objects, fields that are
 * `undefined` are dropped, dates become ISO strings. Use it before storing a request body in a JSON column or
 * handing it to the fit engine, which expects exactly what any other caller would send.
 */
export function jsonCopy<T>(value: T): T {
  return JSON.parse(JSON.stringify(value)) as T;
}
