/** Shown in the editor, the app's footer and every export: the software supports licensed practice, it does not replace it. */
export const SAFETY_TEXT =
  "Results must be verified by a qualified engineer. The governing local codes and the authority having jurisdiction prevail; Panelpoint's checks cover only what they state.";
