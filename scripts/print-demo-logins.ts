import { DEMO_PASSWORD, demoPeople, otherFirm } from "../db/demo/people";

// Printed by `npm run demo` once the server answers.
const width = Math.max(...demoPeople.map((p) => p.title.length));
console.log("Demo logins (password for every account: %s)", DEMO_PASSWORD);
for (const p of demoPeople) console.log(`  ${p.title.padEnd(width)}  ${p.email}`);
console.log(`  ${"Another firm's admin".padEnd(width)}  ${otherFirm.person.email}`);
