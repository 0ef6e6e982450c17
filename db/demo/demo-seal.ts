import { demoPeople } from "./people";

/**
 * The demo engineer of record's seal: an invented licence in an invented
 * jurisdiction, drawn here as an original circular stamp that says it is a
 * demo. Nothing in it belongs to any real licensing board.
 */
const pe = demoPeople.find((p) => p.key === "projectEngineer")!;

export const demoSealProfile = {
  name: pe.name,
  licenceNumber: "PE-DEMO-20417",
  jurisdiction: "Commonwealth of Alder Vale (fictional)",
  expiresOn: "2031-06-30",
};

const ink = "#1f3b57";

/** The stamp: two rings, the name and title around them on circular paths, the licence number in the middle. */
export const demoSealSvg = `<?xml version="1.0" encoding="UTF-8"?>
<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 240 240" width="240" height="240" role="img" aria-label="Demo seal of ${pe.name} (fictional)">
  <defs>
    <path id="seal-top" d="M 32 120 A 88 88 0 0 1 208 120" fill="none"/>
    <path id="seal-bottom" d="M 26 120 A 94 94 0 0 0 214 120" fill="none"/>
  </defs>
  <circle cx="120" cy="120" r="114" fill="#ffffff" stroke="${ink}" stroke-width="4"/>
  <circle cx="120" cy="120" r="72" fill="none" stroke="${ink}" stroke-width="2"/>
  <g fill="${ink}" font-family="Georgia, 'Times New Roman', serif" font-weight="bold" text-anchor="middle">
    <text font-size="17" letter-spacing="2"><textPath href="#seal-top" startOffset="50%">${pe.name.toUpperCase()}</textPath></text>
    <text font-size="14" letter-spacing="3"><textPath href="#seal-bottom" startOffset="50%">PROFESSIONAL ENGINEER</textPath></text>
    <text x="120" y="100" font-size="11">ALDER VALE</text>
    <text x="120" y="124" font-size="15">${demoSealProfile.licenceNumber}</text>
    <text x="120" y="146" font-size="10" font-weight="normal">DEMO · FICTIONAL</text>
  </g>
  <path d="M 78 160 L 162 160" stroke="${ink}" stroke-width="1.5"/>
</svg>
`;
