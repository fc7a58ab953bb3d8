// Whose Enter and Space they are. A focused control keeps its own (a button or link is pressed, a box
// ticked, a list opened, a field typed in); the section view's tools take them — Enter finishes a line,
// Space held pans — when the view has the keyboard (it takes focus when clicked, and keeps the keys
// while no control has focus) or while a tool is mid-gesture and no control has focus.

/** Elements that answer Enter or Space themselves. */
const CONTROLS = [
  'button', 'a[href]', 'input', 'select', 'textarea', 'summary', '[contenteditable]:not([contenteditable="false"])',
  '[role="button"]', '[role="link"]', '[role="menuitem"]', '[role="radio"]', '[role="checkbox"]', '[role="switch"]',
  '[role="tab"]', '[role="option"]', '[role="slider"]', '[role="separator"]',
].join(', ');

/** Returns true when `target` takes typed text (a field, a list, an editable element): the page's keys are then not its own. */
export function isTyping(target: EventTarget | null): boolean {
  return (
    target instanceof HTMLInputElement ||
    target instanceof HTMLTextAreaElement ||
    target instanceof HTMLSelectElement ||
    (target instanceof HTMLElement && target.isContentEditable)
  );
}

/** Returns true when a key pressed with focus on `target` belongs to the section view's tools (`view`: the section view's element). */
export function keyForTools(target: EventTarget | null, view: Element | null, midGesture: boolean): boolean {
  if (!(target instanceof Element)) return true;
  if (view && view.contains(target)) return true;
  if (target.closest(CONTROLS)) return false;
  const nothingFocused = target === target.ownerDocument.body || target === target.ownerDocument.documentElement;
  return nothingFocused || midGesture;
}
