import { afterAll, describe, expect, it } from "vitest";
import { closeDb } from "@/db/knex";
import { authenticate } from "@/lib/auth/authenticate";
import { seedFirm, seedUser, TEST_PASSWORD } from "../support/seed";

afterAll(closeDb);

const ip = () => `10.9.${Math.floor(Math.random() * 250)}.${Math.floor(Math.random() * 250)}`;

describe("signing in", () => {
  it("signs in with the right password, case-insensitively on the e-mail", async () => {
    const firm = await seedFirm();
    const u = await seedUser({ firmId: firm.id });
    const who = await authenticate({ email: u.email.toUpperCase(), password: TEST_PASSWORD, ip: ip() });
    expect(who.id).toBe(u.id);
  });

  it("refuses a wrong password without saying whether the account exists", async () => {
    const firm = await seedFirm();
    const u = await seedUser({ firmId: firm.id });
    await expect(authenticate({ email: u.email, password: "wrong-password", ip: ip() })).rejects.toThrow("E-mail or password is not right.");
    await expect(authenticate({ email: "nobody@test.example", password: "wrong-password", ip: ip() })).rejects.toThrow("E-mail or password is not right.");
  });

  it("refuses a disabled account with a clear message", async () => {
    const firm = await seedFirm();
    const u = await seedUser({ firmId: firm.id, disabled: true });
    await expect(authenticate({ email: u.email, password: TEST_PASSWORD, ip: ip() })).rejects.toThrow(/disabled/);
  });

  it("throttles an account after five failures in a row, even when the sixth password is right", async () => {
    const firm = await seedFirm();
    const u = await seedUser({ firmId: firm.id });
    for (let i = 0; i < 5; i++) {
      await expect(authenticate({ email: u.email, password: `wrong-${i}`, ip: ip() })).rejects.toThrow("E-mail or password is not right.");
    }
    await expect(authenticate({ email: u.email, password: TEST_PASSWORD, ip: ip() })).rejects.toThrow(/Too many failed sign-ins for this account/);
  });

  it("does not count failures that came before a successful sign-in", async () => {
    const firm = await seedFirm();
    const u = await seedUser({ firmId: firm.id });
    for (let i = 0; i < 4; i++) await expect(authenticate({ email: u.email, password: "nope-nope", ip: ip() })).rejects.toThrow();
    await authenticate({ email: u.email, password: TEST_PASSWORD, ip: ip() });
    for (let i = 0; i < 4; i++) await expect(authenticate({ email: u.email, password: "nope-nope", ip: ip() })).rejects.toThrow("E-mail or password is not right.");
    await expect(authenticate({ email: u.email, password: TEST_PASSWORD, ip: ip() })).resolves.toMatchObject({ id: u.id });
  });

  it("throttles one network address that tries many accounts", async () => {
    const firm = await seedFirm();
    const address = ip();
    for (let i = 0; i < 20; i++) await expect(authenticate({ email: `guess${i}@test.example`, password: "guess-guess", ip: address })).rejects.toThrow();
    const u = await seedUser({ firmId: firm.id });
    await expect(authenticate({ email: u.email, password: TEST_PASSWORD, ip: address })).rejects.toThrow(/from this network/);
  });
});
