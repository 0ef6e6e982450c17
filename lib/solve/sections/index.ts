export { cutSection, type CutSectionOptions, type CutSectionResult } from "./cut-section";
export { proposeCuts, type ProposeCutsOptions, type ProposedCut } from "./propose-cuts";
export { resolvePanel, type Panel } from "./resolve-panel";
