/** The key of a cell in an input table's `errors` map: `"3.x"` is row 3 (from 0), column `x`. */
export function cellKey(rowIndex: number, key: string): string {
  return `${rowIndex}.${key}`;
}
