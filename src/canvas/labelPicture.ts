// A Konva label drawn into a canvas of its own, kept from one text to the next. The label is not on the stage: a
// shape on the stage draws its picture (drawLabelPicture). Konva's node.cache() draws the same picture, but makes
// new canvases every time it is called, and during a drag the detachment's label changes its text every move
// (about 3 ms a move went to making and releasing canvases). Setting a font on a canvas outside the page never
// brings the page's style up to date, which setting it on the view's canvas did in the middle of a drag's frame.
import Konva from 'konva';
import { SceneCanvas } from 'konva/lib/Canvas';

/** A label's picture: the canvas, and where its top left lies in the label's own coordinates. */
export interface LabelPicture {
  label: Konva.Label;
  text: Konva.Text;
  canvas: SceneCanvas | null;
  x: number;
  y: number;
  /** The text and pixel ratio the canvas was last drawn with. */
  drawn: { text: string; ratio: number } | null;
}

/** Returns a label (tag under text) made from the given attributes, not yet drawn. */
export function labelPicture(tag: Konva.TagConfig, text: Konva.TextConfig): LabelPicture {
  const label = new Konva.Label({ listening: false });
  const t = new Konva.Text({ ...text, listening: false });
  label.add(new Konva.Tag({ ...tag, listening: false }));
  label.add(t);
  return { label, text: t, canvas: null, x: 0, y: 0, drawn: null };
}

/**
 * Draws the label with `text` into its canvas at `ratio` device pixels a CSS pixel, as Konva's cache() would (the
 * same bounds, rounded the same way, the same drawing call); nothing when it holds that text already. Returns false
 * when there is nothing to draw (an empty label).
 */
export function paintLabelPicture(p: LabelPicture, text: string, ratio: number): boolean {
  if (p.drawn && p.drawn.text === text && p.drawn.ratio === ratio) return p.canvas !== null;
  p.text.text(text);
  p.drawn = { text, ratio };
  // The label's own bounds, without its place and scale on the stage (which the shape drawing it carries).
  const rect = p.label.getClientRect({ skipTransform: true });
  const x = Math.floor(rect.x);
  const y = Math.floor(rect.y);
  const width = Math.ceil(rect.x + rect.width - x);
  const height = Math.ceil(rect.y + rect.height - y);
  if (!(width > 0 && height > 0 && Number.isFinite(x + y + width + height))) {
    p.canvas = null;
    return false;
  }
  if (!p.canvas || p.canvas.pixelRatio !== ratio) {
    p.canvas = new SceneCanvas({ pixelRatio: ratio, width, height });
    p.canvas.isCache = true;
  } else if (p.canvas.width !== Math.floor(width * ratio) || p.canvas.height !== Math.floor(height * ratio)) p.canvas.setSize(width, height);
  else p.canvas.getContext().clear();
  const context = p.canvas.getContext();
  context.save();
  context.translate(-x, -y);
  p.label.drawScene(p.canvas, p.label);
  context.restore();
  p.x = x;
  p.y = y;
  return true;
}

/** Draws the picture in a shape's scene function, in the label's coordinates (the shape's place and scale). */
export function drawLabelPicture(context: Konva.Context, p: LabelPicture): void {
  const canvas = p.canvas;
  if (!canvas) return;
  context.translate(p.x, p.y);
  context.drawImage(canvas._canvas, 0, 0, canvas.width / canvas.pixelRatio, canvas.height / canvas.pixelRatio);
}
