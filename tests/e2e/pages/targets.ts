import type { Page } from "playwright-core";

// WCAG 2.2, success criterion 2.5.5 "Target Size (Enhanced)": 44 × 44 CSS px.
export const MIN_TARGET_PX = 44;

/**
 * Measures every clickable element on the page: links, buttons, inputs, selects,
 * summaries, [role=button], map markers; a checkbox or radio by the label that
 * also toggles it (the larger of the two boxes). Skipped: elements not rendered
 * (display none, zero size, visually hidden like the skip link until focused),
 * and, as 2.5.5's "Inline" exception allows, links inside a sentence or block
 * of running text — an inline link whose block holds other words besides it.
 */
export async function smallTargets(page: Page): Promise<{ measured: number; small: string[] }> {
  return page.evaluate((min) => {
    const visible = (el: Element) => {
      const r = el.getBoundingClientRect();
      const style = getComputedStyle(el);
      return r.width > 1 && r.height > 1 && style.visibility !== "hidden" && style.display !== "none";
    };
    const blockOf = (el: Element): Element => {
      let node = el.parentElement;
      while (node && getComputedStyle(node).display.startsWith("inline")) node = node.parentElement;
      return node ?? document.body;
    };
    const inRunningText = (el: Element) => {
      if (el.tagName !== "A" || !getComputedStyle(el).display.startsWith("inline") || getComputedStyle(el).display === "inline-block") return false;
      const own = (el.textContent ?? "").trim().length;
      const around = (blockOf(el).textContent ?? "").replace(/\s+/g, " ").trim().length;
      return around > own + 3;
    };
    const describe = (el: Element) => {
      const text = (el.getAttribute("aria-label") ?? el.textContent ?? (el as HTMLInputElement).name ?? "").replace(/\s+/g, " ").trim().slice(0, 40);
      const id = el.id ? `#${el.id}` : "";
      return `<${el.tagName.toLowerCase()}${id}${el.getAttribute("type") ? ` type=${el.getAttribute("type")}` : ""}> "${text}"`;
    };
    const selector = "a[href], button, input:not([type=hidden]), select, textarea, summary, [role=button], .leaflet-marker-icon";
    let measured = 0;
    const small: string[] = [];
    const seen = new Set<Element>();
    for (const el of Array.from(document.querySelectorAll(selector))) {
      if (seen.has(el)) continue;
      seen.add(el);
      let box = el.getBoundingClientRect();
      let shown = visible(el);
      const type = (el as HTMLInputElement).type;
      if (el.tagName === "INPUT" && (type === "checkbox" || type === "radio")) {
        const labels = Array.from((el as HTMLInputElement).labels ?? []).filter(visible);
        for (const label of labels) {
          const r = label.getBoundingClientRect();
          if (r.width * r.height > box.width * box.height || !shown) box = r;
          shown = true;
        }
      }
      if (!shown || inRunningText(el)) continue;
      measured++;
      if (box.width < min - 0.5 || box.height < min - 0.5) small.push(`${describe(el)} ${Math.round(box.width)}×${Math.round(box.height)}`);
    }
    return { measured, small };
  }, MIN_TARGET_PX);
}
