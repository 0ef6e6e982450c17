import type { UnitSystem } from "@/lib/solve";
import { propertyDefaults, readMaterial, type DesignMaterial } from "./material-choices";
import { defaultSection, isShape, shapesFor, switchShape } from "./section-shapes";

/** A stored value the form can show: a number, a word, or nothing yet. */
export type FieldValue = number | string | undefined;

/** A member row as the form edits it: the section apart, every other property (K included) flat. */
export type MemberRow = { member: string; section: Record<string, FieldValue>; props: Record<string, FieldValue> };

/** The form's state of a Member design calc. */
export type MemberDesignForm = { truss: string; source: string; material: DesignMaterial; members: MemberRow[] };

/** The inputs as stored, read without trusting them, so the form opens on whatever a document holds. */
export function readMemberDesignInputs(raw: unknown): MemberDesignForm {
  const o = isRecord(raw) ? raw : {};
  const rows = Array.isArray(o.members) ? o.members.filter(isRecord) : [];
  return {
    truss: typeof o.truss === "string" ? o.truss : "",
    source: typeof o.source === "string" ? o.source : "",
    material: readMaterial(o.material),
    members: rows.map((r) => {
      const props: Record<string, FieldValue> = {};
      for (const [k, v] of Object.entries(r)) if (k !== "member" && k !== "section" && isField(v)) props[k] = v;
      const section: Record<string, FieldValue> = {};
      if (isRecord(r.section)) for (const [k, v] of Object.entries(r.section)) if (isField(v)) section[k] = v;
      return { member: typeof r.member === "string" ? r.member : "", section, props };
    }),
  };
}

/** The form as inputs to store; blank optional fields are left out, so the core applies its defaults. */
export function toMemberDesignInputs(form: MemberDesignForm): Record<string, unknown> {
  return {
    truss: form.truss,
    source: form.source,
    material: form.material,
    members: form.members.map((r) => ({ member: r.member, section: defined(r.section), ...defined(r.props) })),
  };
}

/** Row `i` with one change. */
export function updateRow(rows: readonly MemberRow[], i: number, change: (row: MemberRow) => MemberRow): MemberRow[] {
  return rows.map((r, k) => (k === i ? change(r) : r));
}

/**
 * Every row moved to another material: member, section and K stay; the
 * strengths are the new standard's starting values, since a yield stress to
 * one code is not the same property as to another; a shape the new check does
 * not take becomes its default shape.
 */
export function changeMaterial(form: MemberDesignForm, material: DesignMaterial, system: UnitSystem): MemberDesignForm {
  const length = system === "N-mm" ? "mm" : "in";
  const allowed = shapesFor(material).map((o) => o.value);
  return {
    ...form,
    material,
    members: form.members.map((r) => ({
      member: r.member,
      section: isShape(r.section.shape) && allowed.includes(r.section.shape) ? r.section : defaultSection(material, length),
      props: { ...(r.props.K === undefined ? {} : { K: r.props.K }), ...propertyDefaults(material, system) },
    })),
  };
}

/**
 * A new row: the last row's section and properties (members of a chord are
 * usually alike), for the first truss member not yet listed.
 */
export function newMemberRow(form: MemberDesignForm, trussMembers: readonly string[], system: UnitSystem): MemberRow {
  const listed = new Set(form.members.map((r) => r.member));
  const member = trussMembers.find((m) => !listed.has(m)) ?? "";
  const last = form.members[form.members.length - 1];
  if (last) return { member, section: { ...last.section }, props: { ...last.props } };
  return { member, section: defaultSection(form.material, system === "N-mm" ? "mm" : "in"), props: { K: 1, ...propertyDefaults(form.material, system) } };
}

/** A section with another shape, keeping shared dimensions. */
export function withShape(row: MemberRow, shape: string, system: UnitSystem): MemberRow {
  if (!isShape(shape)) return row;
  return { ...row, section: switchShape(row.section, shape, system === "N-mm" ? "mm" : "in") };
}

function defined(o: Record<string, FieldValue>): Record<string, number | string> {
  return Object.fromEntries(Object.entries(o).filter((e): e is [string, number | string] => e[1] !== undefined && e[1] !== ""));
}

function isField(v: unknown): v is number | string {
  return typeof v === "number" || typeof v === "string";
}

function isRecord(v: unknown): v is Record<string, unknown> {
  return typeof v === "object" && v !== null && !Array.isArray(v);
}
