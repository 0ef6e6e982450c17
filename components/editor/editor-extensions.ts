import { Placeholder } from "@tiptap/extensions";
import { ReactNodeViewRenderer } from "@tiptap/react";
import type { CalcKind } from "@/lib/calcs/calc-types";
import { CalcCommands } from "./calc-commands";
import { calcViews } from "./calc-views";
import { FigureView } from "./nodes/figure/figure-view";
import { figureNode } from "./nodes/figure/figure";
import { RemarkHighlights } from "./remark-highlights";
import { baseExtensions, calcNodes } from "./schema-extensions";

/** The browser's extension list: the shared schema plus React views, commands and the placeholder. */
export function editorExtensions({ packageId }: { packageId: string }) {
  const calcs = (Object.keys(calcNodes) as CalcKind[]).map((kind) => {
    return calcNodes[kind].extend({ addNodeView: () => ReactNodeViewRenderer(calcViews[kind]) });
  });
  // The figure view uploads to this package's store; the schema node stays React-free for the server.
  const figure = figureNode.extend({ addOptions: () => ({ packageId }), addNodeView: () => ReactNodeViewRenderer(FigureView) });
  return [...baseExtensions().filter((e) => e.name !== "figure"), figure, ...calcs, CalcCommands, RemarkHighlights, Placeholder.configure({ placeholder: "Write the narrative, or type /truss, /cut, /formula … to insert a calc." })];
}
