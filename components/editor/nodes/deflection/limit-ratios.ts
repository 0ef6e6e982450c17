import type { SelectOption } from "@/components/editor/input-table/input-column";

/**
 * The span ratios engineers quote most: L/240 and L/360 (the total-load and
 * live-load limits of IBC Table 1604.3 for floors), L/500 (a stricter limit
 * an owner's criteria often set, e.g. for footbridges). Any other ratio is
 * entered as custom; the project's criteria decide which applies.
 */
export const limitPresets = [240, 360, 500] as const;

/** The picker's options: the presets by their span ratio, and "custom". */
export const limitOptions: SelectOption[] = [...limitPresets.map((r) => ({ value: String(r), label: `L/${r}` })), { value: "custom", label: "Custom ratio" }];

/** Which option a stored ratio shows as: its preset, or custom. */
export function limitChoice(ratio: number): string {
  return limitPresets.some((r) => r === ratio) ? String(ratio) : "custom";
}
