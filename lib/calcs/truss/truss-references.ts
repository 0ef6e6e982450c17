/** A Truss calc reads nothing from other calcs: its inputs are the model itself. */
export function trussReferences(): string[] {
  return [];
}
