"use client";

import type { JSONContent } from "@tiptap/core";
import { EditorContent, useEditor } from "@tiptap/react";
import { useEffect, useMemo, useState } from "react";
import { ReviewProvider } from "@/components/review/review-context";
import { ReviewPanel } from "@/components/review/review-panel";
import type { CheckerChoice, ReviewAbilities } from "@/components/review/review-types";
import { useReviewController } from "@/components/review/use-review-controller";
import { SafetyNotice } from "@/components/shell/safety-notice";
import { CalcProvider, CalcStore } from "./calc-context";
import { ConflictBanner } from "./conflict-banner";
import { DocumentOutline } from "./document-outline";
import { EditorToolbar } from "./editor-toolbar";
import { editorExtensions } from "./editor-extensions";
import { SaveIndicator } from "./save-indicator";
import { useAutosave } from "./use-autosave";
import { useCalcEvaluation } from "./use-calc-evaluation";

export type PackageEditorProps = {
  packageId: string;
  initialDocument: JSONContent;
  initialVersion: number;
  canEdit: boolean;
  unitSystem: "SI" | "US";
  review: { status: string; assignedChecker: string | null; checkers: CheckerChoice[]; abilities: ReviewAbilities };
};

/** The package: narrative and live calcs in one document, recomputed in the browser, autosaved with its version. */
export function PackageEditor({ packageId, initialDocument, initialVersion, canEdit, unitSystem, review }: PackageEditorProps) {
  const { evaluation, recompute } = useCalcEvaluation(initialDocument);
  const [doc, setDoc] = useState<JSONContent>(initialDocument);
  const autosave = useAutosave({ packageId, initialVersion, canEdit, initialDocument });

  const editor = useEditor({
    immediatelyRender: false,
    editable: canEdit,
    extensions: editorExtensions({ packageId }),
    content: initialDocument,
    editorProps: { attributes: { class: "prose prose-stone max-w-none font-serif pp-document focus:outline-none", "aria-label": "Package text" } },
    onUpdate: ({ editor: e }) => {
      const json = e.getJSON();
      setDoc(json);
      recompute(json);
      autosave.edit(json);
    },
  });

  // A draft kept on this device (offline, crash) comes back on screen before anything else is typed over it.
  useEffect(() => {
    if (editor && autosave.restored) {
      editor.commands.setContent(autosave.restored.document as JSONContent, { emitUpdate: false });
      const json = editor.getJSON();
      setDoc(json);
      recompute(json);
    }
  }, [editor, autosave.restored, recompute]);

  // Submitting, issuing and opening the next revision change what may be edited without a new editor.
  useEffect(() => {
    if (editor && !editor.isDestroyed && editor.isEditable !== canEdit) editor.setEditable(canEdit);
  }, [editor, canEdit]);

  const reviewController = useReviewController({ editor, packageId, status: review.status, abilities: review.abilities, lastSavedAt: autosave.lastSavedAt });
  const calcLabels = useMemo(() => {
    const labels = new Map<string, string>();
    for (const block of doc.content ?? []) if (block.attrs?.id && block.attrs?.label) labels.set(String(block.attrs.id), String(block.attrs.label));
    return labels;
  }, [doc]);

  // The store is created once; node views subscribe to the results they show.
  const [store] = useState(() => new CalcStore(evaluation));
  useEffect(() => store.set(evaluation), [store, evaluation]);
  const calcContext = useMemo(() => ({ store, editable: canEdit, unitSystem }), [store, canEdit, unitSystem]);
  const calcIndexStatus = (index: number) => {
    const id = doc.content?.[index]?.attrs?.id as string | undefined;
    return id ? evaluation.results[id]?.status : undefined;
  };

  return (
    <div className="grid grid-cols-[11rem_minmax(0,1fr)_18rem] gap-4">
      <aside className="sticky top-4 self-start">
        <DocumentOutline
          doc={doc}
          statusOf={calcIndexStatus}
          onJump={(index) => {
            const dom = editor?.view.dom.children[index] as HTMLElement | undefined;
            dom?.scrollIntoView({ behavior: "smooth", block: "start" });
          }}
        />
      </aside>
      <div className="min-w-0 space-y-3">
        <div className="flex items-center gap-3">
          <SafetyNotice className="flex-1 border-l-2 border-caution bg-caution-light px-3 py-2 text-caution" />
          {canEdit ? <SaveIndicator status={autosave.status} lastSavedAt={autosave.lastSavedAt} error={autosave.error} keptOnDevice={autosave.keptOnDevice} lastOverwrite={autosave.lastOverwrite} /> : <span className="pp-tag" data-testid="read-only">Read-only for your role</span>}
        </div>
        {(autosave.conflict || autosave.rejected) && editor && (
          <ConflictBanner
            conflict={autosave.conflict}
            onReload={() => {
              const theirs = autosave.reloadTheirs();
              if (theirs) editor.commands.setContent(theirs as JSONContent, { emitUpdate: false });
            }}
            onKeepMine={() => autosave.keepMine()}
            rejected={autosave.rejected}
            onDismissRejected={autosave.dismissRejected}
            onMerge={() => {
              const merged = autosave.merge();
              if (merged) editor.commands.setContent(merged as JSONContent);
            }}
          />
        )}
        <div className="pp-panel">
          {editor && canEdit && <EditorToolbar editor={editor} />}
          <ReviewProvider value={reviewController.context}>
            <CalcProvider value={calcContext}>
              <div className="px-6 py-6">
                <EditorContent editor={editor} />
              </div>
            </CalcProvider>
          </ReviewProvider>
        </div>
      </div>
      <aside className="sticky top-4 max-h-[calc(100vh-2rem)] self-start overflow-y-auto">
        <ReviewPanel
          editor={editor}
          packageId={packageId}
          status={review.status}
          assignedChecker={review.assignedChecker}
          checkers={review.checkers}
          abilities={review.abilities}
          calcLabels={calcLabels}
          controller={reviewController}
        />
      </aside>
    </div>
  );
}
