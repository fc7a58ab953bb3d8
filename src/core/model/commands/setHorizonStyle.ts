import type { DocHorizon, ProjectDoc } from '../projectDoc';
import { updateHorizon } from './updateHorizon';

export type HorizonStyle = Partial<Pick<DocHorizon, 'colour' | 'visible' | 'locked'>>;

/** Returns the document with the horizon's colour, visibility or lock changed; unchanged when nothing differs. */
export function setHorizonStyle(doc: ProjectDoc, horizonId: string, style: HorizonStyle): ProjectDoc {
  return updateHorizon(doc, horizonId, (h) => {
    const same = (Object.keys(style) as (keyof HorizonStyle)[]).every((k) => style[k] === undefined || style[k] === h[k]);
    return same ? h : { ...h, ...style };
  });
}
