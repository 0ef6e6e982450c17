import type { Knex } from "knex";
import { hashPassword } from "../../lib/auth/password";
import { demoFootbridgeDocument } from "../../lib/document/demo-footbridge-document";
import { saveSealProfile } from "../../lib/seals/save-seal-profile";
import { uploadSealImage } from "../../lib/seals/upload-seal-image";
import { demoSealProfile, demoSealSvg } from "../demo/demo-seal";
import { DEMO_PASSWORD, demoFirm, demoPeople, demoProjects, otherFirm } from "../demo/people";

/** Builds the invented demo scenario. Run once on an empty database (`npm run demo` checks first). */
export async function seed(knex: Knex): Promise<void> {
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  await knex.transaction(async (trx) => {
    const [firm] = await trx.insert({ name: demoFirm.name }).into("firms").returning("id");
    const ids: Record<string, string> = {};
    for (const p of demoPeople) {
      const [u] = await trx.insert({ email: p.email, name: p.name, passwordHash }).into("users").returning("id");
      await trx.insert({ firmId: firm.id, userId: u.id, role: p.firmRole }).into("firmMemberships");
      ids[p.key] = u.id;
    }
    // The engineer of record's seal, so the demo can issue: the image goes to the file store (the fake S3 runs before the seed).
    const pe = { id: ids.projectEngineer, firmId: firm.id as string };
    await saveSealProfile({ actor: pe, input: demoSealProfile, trx });
    await uploadSealImage({ actor: pe, bytes: Buffer.from(demoSealSvg, "utf8"), trx });
    for (const pr of demoProjects) {
      const [project] = await trx
        .insert({ firmId: firm.id, name: pr.name, jobNumber: pr.jobNumber, client: pr.client, site: pr.site, unitSystem: pr.unitSystem, paperSize: pr.paperSize, designCodes: JSON.stringify(pr.designCodes) })
        .into("projects")
        .returning("id");
      for (const [key, role] of Object.entries(pr.members)) {
        await trx.insert({ projectId: project.id, userId: ids[key], role }).into("projectMemberships");
      }
      for (const [i, title] of pr.packages.entries()) {
        // The footbridge's first package is the worked demo: a real narrative with every calc type, linked.
        const document = pr.key === "footbridge" && i === 0 ? JSON.stringify(demoFootbridgeDocument()) : undefined;
        await trx.insert({ projectId: project.id, title, createdBy: ids.engineer, ...(document ? { document } : {}) }).into("packages");
      }
      await trx.insert({ firmId: firm.id, actorId: ids.admin, action: "project.create", entityType: "project", entityId: project.id, projectId: project.id, data: JSON.stringify({ seeded: true }) }).into("auditLog");
    }

    const [other] = await trx.insert({ name: otherFirm.name }).into("firms").returning("id");
    const [ou] = await trx.insert({ email: otherFirm.person.email, name: otherFirm.person.name, passwordHash }).into("users").returning("id");
    await trx.insert({ firmId: other.id, userId: ou.id, role: "admin" }).into("firmMemberships");
    const [op] = await trx.insert({ firmId: other.id, name: otherFirm.project.name, jobNumber: otherFirm.project.jobNumber }).into("projects").returning("id");
    await trx.insert({ projectId: op.id, userId: ou.id, role: "project_engineer" }).into("projectMemberships");
    await trx.insert({ projectId: op.id, title: "Canopy trusses", createdBy: ou.id }).into("packages");
  });
}
