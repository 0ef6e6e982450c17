import { randomUUID } from "node:crypto";
import { describe, expect, it } from "vitest";
import { listCapturedMail } from "@/lib/mail/list-captured-mail";
import { sendMail } from "@/lib/mail/send-mail";

// Runs against the fake SMTP that scripts/test.sh starts; unique subjects keep the tests
// independent of whatever else is in the captured inbox.
describe("mail through the fake SMTP server", () => {
  it("delivers a message that listCapturedMail returns", async () => {
    const subject = `Calc package issued ${randomUUID()}`;
    await sendMail({
      to: "engineer@example.com",
      subject,
      text: "Revision B of the package is ready.",
      html: "<p>Revision <strong>B</strong> of the package is ready.</p>",
    });

    const found = (await listCapturedMail()).find((m) => m.subject === subject);
    expect(found).toBeDefined();
    expect(found?.to).toEqual(["engineer@example.com"]);
    expect(found?.text.trim()).toBe("Revision B of the package is ready.");
    expect(found?.html).toContain("<strong>B</strong>");
    expect(found?.from).toContain("@");
  });

  it("delivers to every recipient and lists the newest message first", async () => {
    const first = `first ${randomUUID()}`;
    const second = `second ${randomUUID()}`;
    await sendMail({ to: ["a@example.com", "b@example.com"], subject: first, text: "one" });
    await sendMail({ to: "c@example.com", subject: second, text: "two" });

    const subjects = (await listCapturedMail()).map((m) => m.subject);
    expect(subjects.indexOf(second)).toBeLessThan(subjects.indexOf(first));
    const both = (await listCapturedMail()).find((m) => m.subject === first);
    expect(both?.to).toEqual(["a@example.com", "b@example.com"]);
  });
});
