import { propertyFields } from "./material-choices";
import type { MemberDesignForm } from "./member-rows";
import { sectionFields } from "./section-shapes";

/** Every field path the form has a control for, so problems on them show on the field and only the rest are listed. */
export function memberFormPaths(form: MemberDesignForm): Set<string> {
  const paths = new Set(["truss", "source", "material"]);
  const props = propertyFields(form.material).map((f) => f.key);
  form.members.forEach((row, i) => {
    const p = `members[${i}]`;
    paths.add(`${p}.member`).add(`${p}.K`).add(`${p}.section`).add(`${p}.section.shape`);
    for (const f of sectionFields(String(row.section.shape))) paths.add(`${p}.section.${f.key}`);
    if (row.section.shape === "timber") paths.add(`${p}.section.product`);
    for (const k of props) paths.add(`${p}.${k}`);
  });
  return paths;
}
