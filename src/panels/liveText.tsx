// Numbers that follow a drag without rendering the panes. The panes render the shown document
// (state/shownDoc.ts), which holds still during a gesture; each number is a LiveText whose text is read from a
// document by one function, the same function for the pane's render and for the live write. After each move during
// a gesture every LiveText's function is read on the store's document and the text written straight into its
// element (reads first, then writes: no layout is read between them). A pane whose live document would need more
// than new text (a row more, an interval that appears) says so with useLiveShape, and the panes then render the
// document at once. When the gesture ends they render it anyway, with the same functions: the text after the
// release is what the last move of the drag showed.
import { createElement, useLayoutEffect, useRef } from 'react';
import type { ProjectDoc } from '../core/model/projectDoc';
import { useDocStore } from '../state/docStore';
import { showDocNow, useShownDoc } from '../state/shownDoc';

/** Reads a text from a document (and its gesture's start, for the live analysis); null when it cannot be shown without a render. */
export type LiveRead = (doc: ProjectDoc, gestureStart: ProjectDoc | null) => string | null;

interface Entry {
  /** The element whose text is written (null before it is mounted); none for a shape (compared, never written). */
  el: HTMLElement | null | 'shape';
  /** An input's value is written instead of its text (never while it has the focus: the person is typing there). */
  value?: boolean;
  read: LiveRead;
  /** A shape's value as last rendered. */
  rendered: string | null;
}

const entries = new Set<Entry>();
let pending = false;

/** One move's writes: every live text read on the store's document, then written where it changed. */
function writeLive(): void {
  pending = false;
  const { doc, gestureStart } = useDocStore.getState();
  if (!gestureStart || useShownDoc.getState().doc === doc) return;
  const writes: [HTMLElement, string][] = [];
  const values: [HTMLInputElement, string][] = [];
  for (const e of entries) {
    const text = e.read(doc, gestureStart);
    if (e.el === 'shape') {
      if (text !== e.rendered) return showDocNow();
    } else if (!e.el) {
      continue;
    } else if (text === null) {
      return showDocNow();
    } else if (e.value) {
      const input = e.el as HTMLInputElement;
      if (input.value !== text && input !== document.activeElement) values.push([input, text]);
    } else if (e.el.textContent !== text) writes.push([e.el, text]);
  }
  for (const [el, text] of writes) writeText(el, text);
  for (const [input, text] of values) input.value = text;
}

/**
 * Sets an element's text, changing its one text node in place where it has one: setting textContent replaced the
 * node, and each new node was styled and laid out afresh (sixty a move at 12 horizons), not merely its text.
 */
export function writeText(el: HTMLElement, text: string): void {
  const t = el.firstChild;
  if (t && !t.nextSibling && t.nodeType === Node.TEXT_NODE) (t as Text).data = text;
  else el.textContent = text;
}

// Written after the task that moved the pointer (its microtasks, where the canvases' React renders run too), so the
// numbers reach the frame that draws the move; several edits in one task write once.
useDocStore.subscribe((s, prev) => {
  if (!s.gestureStart || s.doc === prev.doc || entries.size === 0 || pending) return;
  pending = true;
  queueMicrotask(writeLive);
});

/** Keeps the component's entry registered while it is mounted, with its latest element, reader and rendered shape. */
function useEntry(el: { current: HTMLElement | null } | null, read: LiveRead | null, rendered: string | null, value = false): void {
  const entry = useRef<Entry | null>(null);
  useLayoutEffect(() => {
    if (!read) {
      if (entry.current) entries.delete(entry.current);
      return;
    }
    const e = entry.current ?? (entry.current = { el: null, read, rendered });
    e.el = el ? el.current : 'shape';
    e.read = read;
    e.rendered = rendered;
    e.value = value;
    entries.add(e);
  });
  useLayoutEffect(() => () => {
    if (entry.current) entries.delete(entry.current);
    entry.current = null;
  }, []);
}

type Tag = 'span' | 'strong' | 'div' | 'td' | 'p';

interface LiveTextProps {
  read: LiveRead;
  as?: Tag;
  className?: string;
  title?: string;
  testId?: string;
}

/** An element whose only child is the text `read` gives for the shown document, following the store's document after each move during a gesture. */
export function LiveText({ read, as = 'span', className, title, testId }: LiveTextProps) {
  const { doc, gestureStart } = useShownDoc();
  const text = read(doc, gestureStart) ?? '—';
  const ref = useRef<HTMLElement>(null);
  useEntry(ref, read, null);
  useLayoutEffect(() => {
    // The text may have been written during a gesture: the render's text is put back even where React sees no change.
    if (ref.current && ref.current.textContent !== text) ref.current.textContent = text;
  });
  return createElement(as, { ref, className, title, 'data-testid': testId, 'data-live': '' }, text);
}

/**
 * Declares what of a pane the live text cannot change (rows, which notes are shown): while a gesture is under way,
 * a move whose document reads differently renders the panes instead of writing the numbers.
 */
export function useLiveShape(read: (doc: ProjectDoc, gestureStart: ProjectDoc | null) => string): void {
  const { doc, gestureStart } = useShownDoc();
  useEntry(null, read, read(doc, gestureStart));
}

/**
 * Has an input's value follow the store's document after each move during a gesture, as a LiveText's text does
 * (`read` gives the value's text; the input renders the shown document's own). Not while the input has the focus.
 * With `read` null the input is not followed.
 */
export function useLiveValue(ref: { current: HTMLInputElement | null }, read: LiveRead | null): void {
  useEntry(ref, read, null, true);
}
