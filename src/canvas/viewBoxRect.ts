// Where the section view sits on the page, read once after it may have changed (the box resized, the page
// scrolled or resized, the pointer entered the box) instead of on every pointer move: reading an element's
// client rect while a frame's styles are dirty forces a layout, a few milliseconds a move on a busy page.

let version = 0;
const rects = new WeakMap<Element, { version: number; left: number; top: number; width: number; height: number }>();

/** Marks every cached rect stale: the next read of each element measures it again. */
export function invalidateViewRects(): void {
  version++;
}

/** Returns the element's client rect (corner in px from the viewport's top left, and size), measured at most once between invalidations. */
export function cachedClientRect(el: Element): { left: number; top: number; width: number; height: number } {
  const hit = rects.get(el);
  if (hit && hit.version === version) return hit;
  const r = el.getBoundingClientRect();
  const fresh = { version, left: r.left, top: r.top, width: r.width, height: r.height };
  rects.set(el, fresh);
  return fresh;
}
