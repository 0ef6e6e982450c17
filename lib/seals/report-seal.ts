import { createHash } from "node:crypto";
import { AppError } from "@/lib/app-error";
import type { ReportSeal } from "@/lib/report/report-model";
import { getObject } from "@/lib/storage/get-object";
import { sealContentType } from "./seal-image-key";
import type { FrozenSeal } from "./seal-validity";

/**
 * A revision's frozen seal as the report prints it, its image read from the
 * file store and checked against the SHA-256 frozen with it: an export never
 * shows a seal image other than the one the revision was issued with.
 */
export async function reportSealOf(seal: FrozenSeal | null): Promise<ReportSeal | null> {
  if (!seal) return null;
  const obj = await getObject(seal.imageKey);
  if (!obj) throw new AppError("CONFLICT", `The seal image this revision was issued with is missing from the file store (${seal.imageKey}).`);
  const sha = createHash("sha256").update(obj.body).digest("hex");
  if (sha !== seal.imageSha256) throw new AppError("CONFLICT", "The stored seal image no longer matches the one this revision was issued with; it cannot be printed as its seal.");
  return {
    name: seal.name,
    licenceNumber: seal.licenceNumber,
    jurisdiction: seal.jurisdiction,
    expiresOn: seal.expiresOn,
    imageDataUri: `data:${sealContentType[seal.imageType]};base64,${obj.body.toString("base64")}`,
  };
}
