import { emptyProjectDoc, type ProjectDoc } from '../projectDoc';

/** Longest title or author kept, in characters (the file schema allows 500; a title block holds far less). */
export const PROJECT_INFO_MAX_LENGTH = 200;

/** The fields the user edits; a field left out keeps its value. */
export interface ProjectInfo { title?: string; author?: string }

function clean(text: string): string {
  // One line of text: line breaks and other control characters become spaces, runs of spaces one.
  // eslint-disable-next-line no-control-regex
  const oneLine = text.replace(/[\u0000-\u001f\u007f\u2028\u2029]+/g, ' ').replace(/\s+/g, ' ').trim();
  return Array.from(oneLine).slice(0, PROJECT_INFO_MAX_LENGTH).join('').trim();
}

/** Returns the document with its title and author set (one line, trimmed, capped at PROJECT_INFO_MAX_LENGTH characters; an empty title becomes the default title); unchanged when nothing differs. */
export function setProjectInfo(doc: ProjectDoc, info: ProjectInfo): ProjectDoc {
  const title = info.title === undefined ? doc.title : clean(info.title) || emptyProjectDoc().title;
  const author = info.author === undefined ? doc.author : clean(info.author);
  if (title === doc.title && author === doc.author) return doc;
  return { ...doc, title, author };
}
