import { randomUUID } from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb, db } from "@/db/knex";
import { stopBoss } from "@/lib/jobs/boss";
import { workQueues } from "@/lib/jobs/work-queues";
import { listCapturedMail, type CapturedMail } from "@/lib/mail/list-captured-mail";
import { createRemark } from "@/lib/review/create-remark";
import { submitForCheck } from "@/lib/review/submit-for-check";
import { reviewTeam, statusOf } from "./review-fixtures";

// The real queue (pg-boss on the test database), the real worker code and the fake SMTP:
// a review action queues its mail, the worker sends it, and a refused delivery is retried.
beforeAll(async () => {
  // Earlier test files queue review mail that no worker sent; it is not under test here, and
  // working that backlog first would only delay the mail these tests wait for.
  await db().withSchema("pgboss").from("job").whereIn("state", ["created", "retry"]).delete();
  await workQueues({ pollingIntervalSeconds: 0.5 });
});
afterAll(async () => {
  await stopBoss();
  await closeDb();
});

async function mailTo(address: string, subject: RegExp, timeoutMs = 40_000): Promise<CapturedMail> {
  const until = Date.now() + timeoutMs;
  for (;;) {
    const found = (await listCapturedMail()).find((m) => m.to.includes(address) && subject.test(m.subject));
    if (found) return found;
    if (Date.now() > until) throw new Error(`no mail to ${address} matching ${subject} within ${timeoutMs} ms`);
    await new Promise((r) => setTimeout(r, 250));
  }
}

describe("review notifications by e-mail", () => {
  it("tells the assigned checker that a package was submitted for check, with a link to it", async () => {
    const t = await reviewTeam();
    await submitForCheck({ actor: t.engineer, packageId: t.packageId });
    const mail = await mailTo(t.checker.email, /Submitted for check/);
    expect(mail.subject).toContain(t.project.jobNumber);
    expect(mail.text).toContain(`/packages/${t.packageId}`);
  });

  it("tells the engineers and the project engineer about a new remark, but not the checker who raised it", async () => {
    const t = await reviewTeam();
    await submitForCheck({ actor: t.engineer, packageId: t.packageId });
    const text = `Where does q come from? ${randomUUID().slice(0, 8)}`;
    await createRemark({ actor: t.checker, packageId: t.packageId, calcId: "calc-f1-0001", text });
    expect((await mailTo(t.engineer.email, /New remark/)).text).toContain(text);
    expect((await mailTo(t.pe.email, /New remark/)).text).toContain(text);
    const toChecker = (await listCapturedMail()).filter((m) => m.to.includes(t.checker.email) && /New remark/.test(m.subject));
    expect(toChecker).toEqual([]);
  });

  it("does not hold up the action when delivery is refused, and delivers on a later attempt", async () => {
    const t = await reviewTeam();
    // The fake SMTP greylists this address: its first delivery attempt gets a temporary 451.
    const address = `greylist-${randomUUID()}@example.com`;
    await db().from("users").where({ id: t.checker.id }).update({ email: address });
    await submitForCheck({ actor: t.engineer, packageId: t.packageId });
    expect(await statusOf(t.packageId)).toBe("in_check");

    await mailTo(address, /Submitted for check/);
    const jobs = await db().withSchema("pgboss").from("job").where({ name: "mail.send" }).whereRaw("data->>'to' = ?", [address]).select("retryCount", "state");
    expect(jobs).toHaveLength(1);
    expect(jobs[0].retryCount).toBeGreaterThanOrEqual(1);
    expect(jobs[0].state).toBe("completed");
  }, 60_000);
});
