import type { TrussModel } from "../types";

/**
 * Inputs of `generateTruss`, one variant per shape. Lengths are in the
 * model's length unit, `A` and `E` in the caller's consistent units.
 *
 * Label convention (all shapes): bottom chord joints `L…`, top chord joints
 * `U…`, mid-height joints of a K web `M…`; a member is named by its two end
 * joints, left joint first, upper joint first when they are plumb (`L0U1`,
 * `U1U2`, `U1L1`). For parallel-chord and pitched shapes the number in a
 * label is the panel-point index, so the joint sits at x = index × span / panels;
 * for Fink and fan shapes each chord is numbered on its own, left to right,
 * because their bottom chord is not divided at the top chord panel points.
 */
export type GenerateTrussOptions =
  | PrattHoweOptions
  | WarrenOptions
  | KOptions
  | ParallelChordOptions
  | PitchedOptions
  | ScissorsOptions
  | MonoPitchOptions;

/** Fields every shape takes. */
export type BaseTrussOptions = {
  /** Horizontal distance between the support joints (> 0). */
  span: number;
  /**
   * Number of panels: equal horizontal divisions of the span at the panel points.
   * Must be even for every symmetric shape (all but mono-pitch); Fink and fan need at least 4.
   */
  panels: number;
  /** Cross-section area given to every member (> 0), if the model should carry one. */
  A?: number;
  /** Elastic modulus given to every member (> 0), if the model should carry one. */
  E?: number;
  /** Units recorded on the model; the generator does not convert anything. */
  units?: TrussModel["units"];
};

/**
 * End posts of a parallel-chord truss: `vertical` gives U0…Un with vertical
 * end posts (flat roof and floor trusses); `inclined` gives U1…Un−1 with
 * sloping end posts L0U1 and Un−1Ln (the usual bridge form).
 */
export type EndPosts = "vertical" | "inclined";

/** Web patterns a parallel-chord truss can take. */
export type ParallelChordWeb = "pratt" | "howe" | "warren" | "warren-verticals" | "k";

/** Pratt (diagonals fall toward midspan) or Howe (diagonals rise toward midspan), parallel chords. */
export type PrattHoweOptions = BaseTrussOptions & {
  shape: "pratt" | "howe";
  /** Centre-to-centre distance between the chords (> 0). */
  depth: number;
  /** Default `vertical`. */
  ends?: EndPosts;
};

/**
 * Warren, parallel chords: diagonals zig-zag between a bottom joint at every even
 * panel point and a top joint at every odd one, so a 6-panel Warren has three
 * bottom chord bays. `warren-verticals` adds a vertical at every interior panel point.
 */
export type WarrenOptions = BaseTrussOptions & {
  shape: "warren" | "warren-verticals";
  /** Centre-to-centre distance between the chords (> 0). */
  depth: number;
};

/** K truss: verticals split at mid-height, the K opening toward midspan in each half. */
export type KOptions = BaseTrussOptions & {
  shape: "k";
  /** Centre-to-centre distance between the chords (> 0). */
  depth: number;
};

/** A parallel-chord truss with its web pattern as an option (default Pratt, vertical end posts). */
export type ParallelChordOptions = BaseTrussOptions & {
  shape: "parallel-chord";
  /** Centre-to-centre distance between the chords (> 0). */
  depth: number;
  /** Default `pratt`. */
  web?: ParallelChordWeb;
  /** Only for the `pratt` and `howe` webs; default `vertical`. */
  ends?: EndPosts;
};

/**
 * Gable (triangular top chord, flat bottom chord) shapes. Give exactly one of
 * `rise` (apex height above the bottom chord) or `pitch` (rise per unit of
 * horizontal run, e.g. 4/12).
 */
export type PitchedOptions = BaseTrussOptions & {
  shape: "pratt-pitched" | "howe-pitched" | "fink" | "fan";
  rise?: number;
  pitch?: number;
};

/**
 * Scissors: both chords pitched. Give exactly one of `rise` / `pitch` for the
 * top chord; the bottom chord takes `bottomRise` or `bottomPitch`, by default
 * half the top chord's (common practice), and must stay below the top chord.
 */
export type ScissorsOptions = BaseTrussOptions & {
  shape: "scissors";
  rise?: number;
  pitch?: number;
  bottomRise?: number;
  bottomPitch?: number;
};

/**
 * Mono-pitch: the top chord rises from the left heel (L0) to a vertical end post
 * at the right support. Give exactly one of `rise` (height of that post) or `pitch`.
 */
export type MonoPitchOptions = BaseTrussOptions & {
  shape: "mono-pitch";
  rise?: number;
  pitch?: number;
};

/** Every shape `generateTruss` knows. */
export type TrussShape = GenerateTrussOptions["shape"];
