import { memo, useId } from "react";
import type { CaseResult, JointLoad, TrussModel } from "@/lib/solve";
import { buildScene } from "./build-scene";
import { caseLoads } from "./case-loads";
import { describeDiagram } from "./describe-diagram";
import { PALETTE } from "./diagram-palette";
import { ForceArrow } from "./force-arrow";
import { ForceLegend } from "./force-legend";
import { JointMarker } from "./joint-marker";
import { MemberLabel } from "./member-label";
import { MemberShape } from "./member-shape";
import { ScaleBar } from "./scale-bar";
import { SectionCutLine } from "./section-cut-line";
import { SupportSymbol } from "./support-symbol";

export type TrussDiagramProps = {
  model: TrussModel;
  /** One case's or combination's results; members are then drawn by sign and magnitude. */
  result?: CaseResult;
  /** Case whose loads are drawn: default the first, `null` for none. Ignored when `loads` is given. */
  loadCaseId?: string | null;
  /** Loads to draw instead of a case's, e.g. a combination's factored loads. */
  loads?: readonly JointLoad[];
  /** The SVG's accessible title. */
  title?: string;
  showJointLabels?: boolean;
  showMemberLabels?: boolean;
  /** Force values beside member labels; default on when there is a result. */
  showForces?: boolean;
  showReactions?: boolean;
  /** Default on when there is a result. */
  showLegend?: boolean;
  showScale?: boolean;
  highlightMembers?: readonly string[];
  highlightJoints?: readonly string[];
  invalidMembers?: readonly string[];
  invalidJoints?: readonly string[];
  /** Members cut by a section: emphasised, with a section line drawn across them. */
  cutMembers?: readonly string[];
  /** Free-body mode: the joints of the kept side; everything else is drawn faded. */
  keptJoints?: readonly string[];
  /** Makes every member a button (click, Enter or Space), e.g. to pick the members to cut. */
  onMemberClick?: (memberId: string) => void;
  /** Drawing width in SVG units (the SVG scales to its container). */
  width?: number;
  maxHeight?: number;
  /** Paper colour behind the drawing; white for print. */
  background?: string;
  className?: string;
};

/**
 * A truss drawn to scale: members, joints, supports, loads, and after solving,
 * forces by sign and magnitude. Memoised: every calc re-renders as the author
 * types, and a diagram whose model and result objects are unchanged is skipped.
 */
export const TrussDiagram = memo(function TrussDiagram(props: TrussDiagramProps) {
  const { model, result, onMemberClick, background = PALETTE.paperRaised } = props;
  const titleId = useId();
  const descId = useId();
  const unit = model.units?.force ?? "";
  const loadCaseId = props.loads ? undefined : (props.loadCaseId === undefined ? model.loadCases?.[0]?.id : props.loadCaseId);
  const showReactions = props.showReactions ?? false;
  const scene = buildScene({
    model,
    result,
    loads: props.loads ?? caseLoads(model, props.loadCaseId),
    forceUnit: unit,
    showForces: props.showForces ?? result !== undefined,
    showReactions,
    showJointLabels: props.showJointLabels ?? true,
    showMemberLabels: props.showMemberLabels ?? true,
    highlightMembers: props.highlightMembers,
    highlightJoints: props.highlightJoints,
    invalidMembers: props.invalidMembers,
    invalidJoints: props.invalidJoints,
    cutMembers: props.cutMembers,
    keptJoints: props.keptJoints,
    width: props.width,
    maxHeight: props.maxHeight,
  });
  const { view } = scene;
  const description = describeDiagram({
    joints: scene.joints.length,
    members: scene.members.length,
    supports: scene.supports.length,
    skippedMembers: scene.skippedMembers,
    loadCaseId,
    forces: result?.forces,
    unit,
  });
  const showLegend = props.showLegend ?? result !== undefined;

  return (
    <figure className={props.className} data-truss-diagram="">
      <svg
        viewBox={view.viewBox}
        role={onMemberClick ? "group" : "img"}
        aria-labelledby={titleId}
        aria-describedby={descId}
        style={{ width: "100%", height: "auto", display: "block", fontFamily: "var(--font-ui), system-ui, sans-serif" }}
      >
        <title id={titleId}>{props.title ?? "Truss diagram"}</title>
        <desc id={descId}>{description}</desc>
        <rect width={view.width} height={view.height} fill={background} />
        {scene.joints.length === 0 ? (
          <text x={view.width / 2} y={view.height / 2} textAnchor="middle" dominantBaseline="middle" fontSize={13} fill={PALETTE.inkFaint}>
            No joints to draw yet
          </text>
        ) : (
          <>
            {scene.supports.map((s) => <SupportSymbol key={s.key} spec={s} background={background} />)}
            {scene.members.map((m) => <MemberShape key={m.id} spec={m} background={background} onActivate={onMemberClick} />)}
            <SectionCutLine points={scene.cutLine} />
            {scene.loads.map((a) => <ForceArrow key={`l:${a.key}`} spec={a} kind="load" />)}
            {scene.reactions.map((a) => <ForceArrow key={`r:${a.key}`} spec={a} kind="reaction" />)}
            {scene.joints.map((j) => <JointMarker key={j.id} spec={j} background={background} />)}
            {scene.members.map((m) => <MemberLabel key={m.id} spec={m} background={background} />)}
            {(props.showScale ?? true) && <ScaleBar x={14} y={view.height - 12} scale={view.scale} unit={model.units?.length} />}
          </>
        )}
      </svg>
      {showLegend && (
        <figcaption className="mt-2">
          <ForceLegend
            senses={scene.senses.filter((s) => s !== "unknown")}
            maxForce={scene.maxForce}
            unit={unit}
            showSelected={scene.members.some((m) => m.highlighted)}
            showInvalid={scene.members.some((m) => m.invalid) || scene.joints.some((j) => j.invalid)}
            showLoads={scene.loads.length > 0}
            showReactions={scene.reactions.length > 0}
            background={background}
          />
        </figcaption>
      )}
    </figure>
  );
});
