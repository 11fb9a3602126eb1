import type { Locator, Page } from '@playwright/test';

/**
 * Whether the page scrolls sideways (document.scrollingElement.scrollWidth > innerWidth), and if so the outermost
 * elements that reach past the window's right edge (tag, test id or class, and their right edge), or null.
 */
export async function pageOverflow(page: Page) {
  return page.evaluate(() => {
    const root = document.scrollingElement ?? document.documentElement;
    if (root.scrollWidth <= innerWidth) return null;
    const describe = (el: Element) => {
      const id = el.getAttribute('data-testid');
      const cls = typeof el.className === 'string' ? el.className.split(/\s+/).slice(0, 4).join('.') : '';
      const text = (el.textContent ?? '').trim().slice(0, 30);
      return `<${el.tagName.toLowerCase()}${id ? ` data-testid=${id}` : ''}${cls ? ` .${cls}` : ''}> "${text}"`;
    };
    const scrolls = (el: Element) => getComputedStyle(el).overflowX !== 'visible';
    // The first elements, going down the tree, that reach past the window's right edge while nothing around them
    // scrolls or clips them.
    const culprits: string[] = [];
    const walk = (el: Element) => {
      for (const kid of el.children) {
        const r = kid.getBoundingClientRect();
        if (r.right > innerWidth + 0.5 && r.width > 0) culprits.length < 6 && culprits.push(`${describe(kid)} → ${Math.round(r.right)} px`);
        else if (!scrolls(kid)) walk(kid);
      }
    };
    walk(document.body);
    // Positioned elements escape a scroller that is not their containing block (an sr-only span in a wide table).
    for (const el of document.querySelectorAll('body *')) {
      const pos = getComputedStyle(el).position;
      const r = el.getBoundingClientRect();
      if ((pos === 'absolute' || pos === 'fixed') && r.right > innerWidth + 0.5 && culprits.length < 6)
        culprits.push(`positioned ${describe(el)} → ${Math.round(r.right)} px`);
    }
    return { scrollWidth: root.scrollWidth, innerWidth, culprits };
  });
}

/**
 * Text that is cut off where it stands: an element that hides its overflow (overflow hidden or clip, or an ellipsis)
 * while its content is wider or taller than its box, and SVG text that reaches outside its drawing. Scrolling
 * containers are fine: they show everything on a swipe. Names marked `data-abbreviates` may be shortened (part
 * tags); nothing else may. Returns a line per clipped element.
 */
export async function clippedText(scope: Page | Locator): Promise<string[]> {
  const run = (within?: Element) => {
    const root: Element | Document = within ?? document;
    const found: string[] = [];
    const visible = (el: Element) => {
      const r = el.getBoundingClientRect();
      const s = getComputedStyle(el);
      return r.width > 0 && r.height > 0 && s.visibility !== 'hidden' && s.display !== 'none';
    };
    for (const el of root.querySelectorAll<HTMLElement>('body *:not(svg *)')) {
      if (!(el instanceof HTMLElement) || !visible(el) || !(el.textContent ?? '').trim()) continue;
      // A name that may be shortened where space is fixed (a part tag); what tells it apart stands beside it.
      if (el.closest('[data-abbreviates], .sr-only')) continue;
      const s = getComputedStyle(el);
      const hidesX = s.overflowX === 'hidden' || s.overflowX === 'clip' || s.textOverflow === 'ellipsis';
      const hidesY = s.overflowY === 'hidden' || s.overflowY === 'clip';
      const overX = hidesX && el.scrollWidth > el.clientWidth + 1;
      const overY = hidesY && el.scrollHeight > el.clientHeight + 1 && !el.matches('[aria-hidden="true"], .sr-only');
      if (overX || overY)
        found.push(
          `"${(el.textContent ?? '').trim().slice(0, 60)}" in <${el.tagName.toLowerCase()} class="${el.className}"> (${el.scrollWidth}×${el.scrollHeight} in ${el.clientWidth}×${el.clientHeight})`,
        );
    }
    // A text box hides what does not fit inside it: its value must fit (a length keeps its ″).
    for (const input of root.querySelectorAll<HTMLInputElement>('input:not([type]), input[type="text"], input[type="search"]')) {
      if (visible(input) && input.value && input.scrollWidth > input.clientWidth + 1) {
        found.push(
          `value "${input.value}" of the field ${input.getAttribute('aria-label') ?? input.name ?? input.id} (${input.scrollWidth} in ${input.clientWidth})`,
        );
      }
    }
    for (const text of root.querySelectorAll<SVGTextElement>('svg text')) {
      if (!visible(text) || !(text.textContent ?? '').trim()) continue;
      const svg = text.ownerSVGElement;
      if (!svg) continue;
      const t = text.getBoundingClientRect();
      const box = svg.getBoundingClientRect();
      if (t.left < box.left - 0.5 || t.right > box.right + 0.5 || t.top < box.top - 0.5 || t.bottom > box.bottom + 0.5) {
        found.push(
          `SVG text "${text.textContent}" reaches outside its drawing (${Math.round(t.left)}–${Math.round(t.right)} × ${Math.round(t.top)}–${Math.round(t.bottom)} in ${Math.round(box.left)}–${Math.round(box.right)} × ${Math.round(box.top)}–${Math.round(box.bottom)})`,
        );
      }
    }
    return found;
  };
  // The function is sent to the page as source: it must not use anything from this module.
  return 'goto' in scope ? scope.evaluate(run as () => string[]) : scope.evaluate(run);
}
