import { afterAll, describe, expect, it } from "vitest";
import { closeDb } from "@/db/knex";
import { findPackage, listPackages } from "@/lib/data/packages";
import { createPackage } from "@/lib/packages/create-package";
import { deletePackage } from "@/lib/packages/delete-package";
import { renamePackage } from "@/lib/packages/rename-package";
import { createProject } from "@/lib/projects/create-project";
import { projectCreateInput } from "@/lib/validation/project-input";
import { seedPackage, seedTeam } from "../support/seed";

afterAll(closeDb);

describe("projects and packages", () => {
  it("makes the creator of a project its project engineer", async () => {
    const t = await seedTeam();
    const p = await createProject({ actor: t.engineer, input: projectCreateInput.parse({ name: "Canal bridge", jobNumber: `J-${Date.now()}` }) });
    expect(p.unitSystem).toBe("SI");
    expect(p.designCodes).toEqual([]);
  });

  it("refuses a job number the firm already uses, naming the field", async () => {
    const t = await seedTeam();
    await expect(createProject({ actor: t.pe, input: projectCreateInput.parse({ name: "Again", jobNumber: t.project.jobNumber }) })).rejects.toMatchObject({ code: "CONFLICT", path: "jobNumber" });
  });

  it("starts a package as a draft at version 1 with an empty document", async () => {
    const t = await seedTeam();
    const k = await createPackage({ actor: t.engineer, projectId: t.project.id, title: "Trusses" });
    expect(k).toMatchObject({ status: "draft", version: 1, title: "Trusses" });
    const full = await findPackage(t.project.id, k.id, { withDocument: true });
    expect(full?.document).toEqual({ type: "doc", content: [] });
    const light = await findPackage(t.project.id, k.id);
    expect(light).not.toHaveProperty("document");
  });

  it("renames a package and deletes it only while it is a draft", async () => {
    const t = await seedTeam();
    const k = await createPackage({ actor: t.engineer, projectId: t.project.id, title: "Old" });
    expect((await renamePackage({ actor: t.engineer, projectId: t.project.id, packageId: k.id, title: "New" })).title).toBe("New");
    const inCheck = await seedPackage({ projectId: t.project.id, status: "in_check" });
    await expect(deletePackage({ actor: t.engineer, projectId: t.project.id, packageId: inCheck.id })).rejects.toMatchObject({ code: "CONFLICT" });
    await deletePackage({ actor: t.engineer, projectId: t.project.id, packageId: k.id });
    expect((await listPackages(t.project.id)).map((p) => p.id)).toEqual([inCheck.id]);
  });

  it("does not find a package through another project's id", async () => {
    const a = await seedTeam();
    const b = await seedTeam();
    const k = await seedPackage({ projectId: a.project.id });
    expect(await findPackage(b.project.id, k.id)).toBeUndefined();
  });
});
