/** Keys that press a focused role="button" element that is not a native <button>, as a native one would. */
export function isActivationKey(key: string): boolean {
  return key === "Enter" || key === " " || key === "Spacebar";
}
