/** A key that is equal for two factor maps exactly when every factor is, so repeated combinations can be dropped. */
export function factorSignature(factors: Record<string, unknown>): string {
  return JSON.stringify(Object.keys(factors).map((id) => [id, factors[id]]));
}
