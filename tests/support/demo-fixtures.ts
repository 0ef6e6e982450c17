import { db } from "@/db/knex";
import { DEMO_PASSWORD, demoPeople, otherFirm } from "@/db/demo/people";

/** Ids of the seeded demo scenario, looked up by their invented names. */
export async function demoIds() {
  const firm = await db().from("firms").select("id").where({ name: "Kestrel & Vane Engineering" }).first();
  const footbridge = await db().from("projects").select("id").where({ jobNumber: "KV-2026-014" }).first();
  const pkg = await db().from("packages").select("id").where({ projectId: footbridge.id }).orderBy("title").first();
  const trussPackage = await db().from("packages").select("id").where({ projectId: footbridge.id, title: "Main trusses — 24 m Pratt span" }).first();
  const otherProject = await db().from("projects").select("id").where({ jobNumber: otherFirm.project.jobNumber }).first();
  return { firmId: firm.id as string, footbridgeId: footbridge.id as string, packageId: pkg.id as string, trussPackageId: trussPackage.id as string, otherProjectId: otherProject.id as string };
}

export const demoLogin = (key: (typeof demoPeople)[number]["key"]) => {
  const p = demoPeople.find((d) => d.key === key)!;
  return { email: p.email, password: DEMO_PASSWORD, name: p.name };
};

export const otherFirmLogin = { email: otherFirm.person.email, password: DEMO_PASSWORD, name: otherFirm.person.name };
