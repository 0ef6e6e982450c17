import createDOMPurify from "dompurify";
import { JSDOM } from "jsdom";
import { AppError } from "@/lib/app-error";

const SVG_NS = "http://www.w3.org/2000/svg";

/** A local reference (`#id`) or an embedded raster image; anything else would make the seal fetch from elsewhere. */
function isSafeReference(value: string): boolean {
  const v = value.trim();
  return v.startsWith("#") || /^data:image\/(png|jpeg);base64,[a-z0-9+/=\s]*$/i.test(v);
}

/**
 * Cleans an uploaded SVG seal with DOMPurify's SVG profile on a jsdom window:
 * scripts, event handlers and foreignObject are removed by the profile; we
 * also drop <style>, external href/xlink:href and url(…) references, so the
 * stored image is inert and self-contained. Returns serialized XML with the
 * SVG namespace, ready to serve as image/svg+xml.
 */
export function sanitizeSealSvg(source: string): string {
  const { window } = new JSDOM("");
  const purify = createDOMPurify(window as unknown as Parameters<typeof createDOMPurify>[0]);
  purify.addHook("afterSanitizeAttributes", (node) => {
    for (const attr of Array.from(node.attributes ?? [])) {
      const name = attr.name.toLowerCase();
      if ((name === "href" || name === "xlink:href") && !isSafeReference(attr.value)) node.removeAttribute(attr.name);
      else if (/url\(\s*['"]?(?!#)/i.test(attr.value)) node.removeAttribute(attr.name);
    }
  });
  const fragment = purify.sanitize(source, {
    USE_PROFILES: { svg: true, svgFilters: true },
    FORBID_TAGS: ["foreignObject", "style", "script", "a"],
    RETURN_DOM_FRAGMENT: true,
  }) as unknown as DocumentFragment;
  const root = Array.from(fragment.childNodes).find((n): n is Element => n.nodeType === 1);
  if (!root || root.localName !== "svg" || root.namespaceURI !== SVG_NS) {
    throw new AppError("INVALID", "The SVG has no <svg> root element left after cleaning; upload a PNG or a plain SVG drawing.", "file");
  }
  if (root.childNodes.length === 0) throw new AppError("INVALID", "The SVG is empty after cleaning (nothing drawable is left); upload a PNG or a plain SVG drawing.", "file");
  return new window.XMLSerializer().serializeToString(root);
}
