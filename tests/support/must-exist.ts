/** A row the test set up or expects: the test fails here, naming it, when the query found none. */
export function mustExist<T>(row: T, what: string): NonNullable<T> {
  if (row === undefined || row === null) throw new Error(`Expected ${what} to exist`);
  return row;
}
