export { generateTruss, type GeneratedTruss } from "./generate-truss";
export type {
  BaseTrussOptions,
  EndPosts,
  GenerateTrussOptions,
  KOptions,
  MonoPitchOptions,
  ParallelChordOptions,
  ParallelChordWeb,
  PitchedOptions,
  PrattHoweOptions,
  ScissorsOptions,
  TrussShape,
  WarrenOptions,
} from "./generate-truss-options";
export { lineLoadToPanelLoads, type LineLoadToPanelLoadsOptions } from "./line-load-to-panel-loads";
export { addLoadCase } from "./add-load-case";
