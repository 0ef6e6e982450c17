"use client";

import { useCallback, useState } from "react";
import { toast } from "sonner";
import { fetchJson } from "@/lib/client/fetch-json";
import { CommentCard } from "./comment-card";
import type { CommentListDto, DraftPlaces, LetterDto } from "./plan-review-types";
import { RecordCommentsForm } from "./record-comments-form";
import { ResponseLetterPreview } from "./response-letter-preview";

export type PlanReviewWorkspaceProps = {
  packageId: string;
  issued: boolean;
  canManage: boolean;
  places: DraftPlaces;
  initialList: CommentListDto;
  initialLetter: LetterDto;
};

/** Recording, answering and previewing: everything reloads from the server after each save, so the letter shows what was stored. */
export function PlanReviewWorkspace({ packageId, issued, canManage, places, initialList, initialLetter }: PlanReviewWorkspaceProps) {
  const [list, setList] = useState(initialList);
  const [letter, setLetter] = useState(initialLetter);
  const [generation, setGeneration] = useState(0);

  const reload = useCallback(async () => {
    try {
      const [l, p] = await Promise.all([
        fetchJson<CommentListDto>(`/api/v1/packages/${packageId}/plan-review`),
        fetchJson<LetterDto>(`/api/v1/packages/${packageId}/plan-review/letter`),
      ]);
      setList(l);
      setLetter(p);
      setGeneration((g) => g + 1);
    } catch (e) {
      toast.error(e instanceof Error ? e.message : "Could not reload the comments.");
    }
  }, [packageId]);

  const current = list.comments.filter((c) => list.answers && c.revisionId === list.answers.id);
  const earlier = list.comments.filter((c) => !list.answers || c.revisionId !== list.answers.id);

  return (
    <div className="grid gap-4 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
      <div className="space-y-4">
        {!list.answers ? (
          <p className="text-sm text-ink-soft">Comments are recorded on an issued revision. Issue Rev 0 first; the permit office’s comments on it are then answered in the next draft.</p>
        ) : issued ? (
          <p className="text-sm text-ink-soft">Rev {list.answers.label} is issued. Start the next revision to record the permit office’s comments on it and answer them.</p>
        ) : (
          canManage && <RecordCommentsForm packageId={packageId} answers={list.answers} revisions={list.revisions} onSaved={reload} />
        )}
        {list.answers && (
          <section className="space-y-2" aria-label="Comments on the latest revision">
            <h3 className="font-serif text-lg font-semibold">Comments on Rev {list.answers.label}</h3>
            {current.length === 0 ? (
              <p className="text-sm text-ink-soft">None recorded.</p>
            ) : (
              <ul className="space-y-2">
                {current.map((c) => <CommentCard key={`${c.id}-${generation}`} packageId={packageId} comment={c} places={places} canManage={canManage} onChanged={reload} />)}
              </ul>
            )}
          </section>
        )}
        {earlier.length > 0 && (
          <details className="text-sm">
            <summary className="cursor-pointer text-ink-soft">Earlier comments, answered by later revisions ({earlier.length})</summary>
            <ul className="mt-2 space-y-2">
              {earlier.map((c) => <CommentCard key={`${c.id}-${generation}`} packageId={packageId} comment={c} places={places} canManage={false} onChanged={reload} />)}
            </ul>
          </details>
        )}
      </div>
      <ResponseLetterPreview preview={letter} />
    </div>
  );
}
