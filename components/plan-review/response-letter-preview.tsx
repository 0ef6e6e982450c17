import type { LetterDto } from "./plan-review-types";

/** The letter as it will travel with the next revision: each comment quoted, the response, and where it is answered. */
export function ResponseLetterPreview({ preview }: { preview: LetterDto }) {
  const { letter, problems } = preview;
  return (
    <section className="space-y-3 rounded-sm border border-rule bg-paper p-4" aria-label="Response letter" data-testid="response-letter">
      <h3 className="font-serif text-lg font-semibold">Response letter</h3>
      {!letter ? (
        <p className="text-sm text-ink-soft">No comments to answer yet. When comments are recorded on the latest issued revision, the letter answering them appears here and is frozen into the next revision when it is issued.</p>
      ) : (
        <>
          <p className="text-sm">
            Response to the plan-review comments on Rev {letter.answersRevisionLabel}
            {letter.reviewer ? ` by ${letter.reviewer}` : ""}
            {letter.date ? `, received ${letter.date}` : ""}.
          </p>
          {problems.length > 0 && (
            <ul className="pp-error space-y-0.5 text-sm" data-testid="letter-problems">
              {problems.map((p) => <li key={p}>{p}</li>)}
            </ul>
          )}
          <ol className="space-y-3">
            {letter.comments.map((c) => (
              <li key={c.number} className="space-y-1 text-sm" data-testid="letter-comment">
                <p className="font-semibold">Comment {c.number}</p>
                <blockquote className="whitespace-pre-wrap border-l-2 border-rule pl-2.5 italic text-ink-soft">{c.text}</blockquote>
                <p className="whitespace-pre-wrap"><span className="pp-label mr-1">Response</span>{c.response || <span className="text-ink-faint">— not yet written —</span>}</p>
                {c.answeredIn.length > 0 && <p className="text-xs"><span className="pp-label mr-1">Answered in</span>{c.answeredIn.join("; ")}</p>}
              </li>
            ))}
          </ol>
        </>
      )}
    </section>
  );
}
