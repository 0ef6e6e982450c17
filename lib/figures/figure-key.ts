/** Where a package's figure lives in the file store: under its firm and package, so a key can never cross firms. */
export function figureKey(firmId: string, packageId: string, figureId: string): string {
  return `firms/${firmId}/packages/${packageId}/figures/${figureId}`;
}

/** The path the document stores and the browser loads (through the access-checked route). */
export function figureSrc(packageId: string, figureId: string): string {
  return `/api/v1/packages/${packageId}/figures/${figureId}`;
}
