import { pdflibAddPlaceholder } from "@signpdf/placeholder-pdf-lib";
import { P12Signer } from "@signpdf/signer-p12";
import { SignPdf } from "@signpdf/signpdf";
import { SUBFILTER_ADOBE_PKCS7_DETACHED } from "@signpdf/utils";
import { PDFDocument } from "pdf-lib";

export type SignPdfOptions = {
  /** The signing certificate with its private key (PKCS#12). */
  p12: Buffer;
  passphrase: string;
  /** The signer's name as the signature dictionary carries it. */
  name: string;
  reason: string;
  location: string;
  contactInfo?: string;
};

/**
 * Signs a PDF with a detached CMS signature over the whole file (one ByteRange
 * that leaves out only the signature itself). adbe.pkcs7.detached, not
 * ETSI.CAdES.detached: the P12 signer's CMS carries no ESS signing-certificate-v2
 * attribute, which CAdES requires, so claiming CAdES would be untrue.
 * No encryption, no permissions and no DocMDP transform: a reviewer's later
 * annotations (an incremental update) leave the signature valid.
 */
export async function signPdf(pdf: Buffer, options: SignPdfOptions): Promise<Buffer> {
  const doc = await PDFDocument.load(pdf, { updateMetadata: false });
  pdflibAddPlaceholder({
    pdfDoc: doc,
    reason: options.reason,
    contactInfo: options.contactInfo ?? "",
    name: options.name,
    location: options.location,
    subFilter: SUBFILTER_ADOBE_PKCS7_DETACHED,
    // A 2048-bit key with a short chain fits well inside 16 KiB of placeholder.
    signatureLength: 16384,
    appName: "Panelpoint",
  });
  // Without object streams the placeholder stays a plain, findable /ByteRange and /Contents.
  const prepared = Buffer.from(await doc.save({ useObjectStreams: false }));
  const signer = new P12Signer(options.p12, { passphrase: options.passphrase });
  return new SignPdf().sign(prepared, signer);
}
