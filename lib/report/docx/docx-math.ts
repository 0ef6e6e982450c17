import { ImportedXmlComponent, TextRun, type ParagraphChild } from "docx";
import { texToOmml } from "./tex-to-omml";

/** Counts every equation the renderer meets, so none is silently dropped. */
export type EquationTally = {
  converted: number;
  failed: { tex: string; reason: string }[];
};

export function newEquationTally(): EquationTally {
  return { converted: 0, failed: [] };
}

/**
 * One equation as paragraph content: a native `m:oMath` (wrapped in
 * `m:oMathPara` when it stands on its own line), or, when the TeX cannot be
 * converted, the TeX itself in the code font so the reader still sees it.
 * ImportedXmlComponent writes the parsed OMML as it is; docx already declares
 * `xmlns:m` on the document root, and the OMML carries its own declaration.
 */
export function equationRun(tex: string, tally: EquationTally, options: { display?: boolean } = {}): ParagraphChild {
  const conversion = texToOmml(tex);
  if (!conversion.ok) {
    tally.failed.push({ tex, reason: conversion.reason });
    return new TextRun({ text: tex, style: "CodeText" });
  }
  tally.converted += 1;
  const xml = options.display
    ? `<m:oMathPara xmlns:m="http://schemas.openxmlformats.org/officeDocument/2006/math">${conversion.omml}</m:oMathPara>`
    : conversion.omml;
  // ImportedXmlComponent is an XmlComponent like every ParagraphChild, but the
  // ParagraphChild union does not list it.
  return ImportedXmlComponent.fromXmlString(xml) as unknown as ParagraphChild;
}
