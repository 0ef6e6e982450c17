import { Placeholder } from "@tiptap/extensions";
import { ReactNodeViewRenderer } from "@tiptap/react";
import type { CalcKind } from "@/lib/calcs/calc-types";
import { CalcCommands } from "./calc-commands";
import { calcViews } from "./calc-views";
import { baseExtensions, calcNodes } from "./schema-extensions";

/** The browser's extension list: the shared schema plus React views, commands and the placeholder. */
export function editorExtensions() {
  const calcs = (Object.keys(calcNodes) as CalcKind[]).map((kind) => {
    return calcNodes[kind].extend({ addNodeView: () => ReactNodeViewRenderer(calcViews[kind]) });
  });
  return [...baseExtensions(), ...calcs, CalcCommands, Placeholder.configure({ placeholder: "Write the narrative, or type /truss, /cut, /formula … to insert a calc." })];
}
