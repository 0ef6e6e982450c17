import type { FirmRole, ProjectRole } from "../../lib/access/roles";

/**
 * The invented demo scenario (PRODUCT.md): every name, address and number here
 * is fictional. `.example` addresses can never reach a real mailbox.
 */
export const DEMO_PASSWORD = "kestrel-demo-2026";

export type DemoPerson = { key: "admin" | "engineer" | "checker" | "projectEngineer"; name: string; email: string; firmRole: FirmRole; title: string };

export const demoFirm = { name: "Kestrel & Vane Engineering" };

export const demoPeople: DemoPerson[] = [
  { key: "engineer", name: "Tomas Lindqvist", email: "engineer@kestrel-vane.example", firmRole: "member", title: "Engineer (author)" },
  { key: "checker", name: "Priya Raman", email: "checker@kestrel-vane.example", firmRole: "member", title: "Checker" },
  { key: "projectEngineer", name: "Helen Marsh", email: "pe@kestrel-vane.example", firmRole: "member", title: "Project engineer (engineer of record)" },
  { key: "admin", name: "Owen Achterberg", email: "admin@kestrel-vane.example", firmRole: "admin", title: "Firm admin" },
];

export type DemoProject = {
  key: "footbridge" | "marketHall";
  name: string;
  jobNumber: string;
  client: string;
  site: string;
  unitSystem: "SI" | "US";
  paperSize: "A4" | "Letter";
  designCodes: string[];
  members: Partial<Record<DemoPerson["key"], ProjectRole>>;
  packages: string[];
};

export const demoProjects: DemoProject[] = [
  {
    key: "footbridge",
    name: "Alder Creek Footbridge",
    jobNumber: "KV-2026-014",
    client: "Alder Creek Parks Trust",
    site: "Alder Creek greenway, crossing 3",
    unitSystem: "SI",
    paperSize: "A4",
    designCodes: ["EN 1990:2002+A1:2005", "EN 1991-2:2003 (pedestrian actions)", "EN 1993-1-1:2005"],
    members: { engineer: "engineer", checker: "checker", projectEngineer: "project_engineer" },
    packages: ["Main trusses — 24 m Pratt span", "Deck, bracing and bearings"],
  },
  {
    key: "marketHall",
    name: "Millbrook Market Hall roof",
    jobNumber: "KV-2026-021",
    client: "Millbrook Town Council",
    site: "12 Weir Street, Millbrook",
    unitSystem: "US",
    paperSize: "Letter",
    designCodes: ["ASCE/SEI 7-22", "NDS 2018"],
    members: { engineer: "engineer", projectEngineer: "project_engineer" },
    packages: ["Timber Fink roof trusses"],
  },
];

/** A second, unrelated firm: its data must never show to Kestrel & Vane, and the other way round. */
export const otherFirm = {
  name: "Harrow Lane Structures",
  person: { name: "Dana Whitcombe", email: "dana@harrow-lane.example" },
  project: { name: "Quarry Road canopy", jobNumber: "HL-2026-007" },
};
