import { nameLengthProblem } from '../limits';
import { emptyProjectDoc, type ProjectDoc } from '../projectDoc';

/** The fields the user edits; a field left out keeps its value. */
export interface ProjectInfo { title?: string; author?: string }

function clean(text: string): string {
  // One line of text: line breaks and other control characters become spaces, runs of spaces one.
  // eslint-disable-next-line no-control-regex
  return text.replace(/[\u0000-\u001f\u007f\u2028\u2029]+/g, ' ').replace(/\s+/g, ' ').trim();
}

/** Returns why the title or author cannot be kept (over the one name-length limit of limits.ts, as the dialog says), or null when both fit. */
export function projectInfoProblem(info: ProjectInfo): string | null {
  const title = info.title === undefined ? null : nameLengthProblem(clean(info.title), 'title');
  const author = info.author === undefined ? null : nameLengthProblem(clean(info.author), 'author');
  return title ?? author;
}

/** Returns the document with its title and author set (one line, trimmed; an empty title becomes the default title); unchanged when nothing differs or when projectInfoProblem refuses them (nothing is cut short: the caller says why). */
export function setProjectInfo(doc: ProjectDoc, info: ProjectInfo): ProjectDoc {
  if (projectInfoProblem(info)) return doc;
  const title = info.title === undefined ? doc.title : clean(info.title) || emptyProjectDoc().title;
  const author = info.author === undefined ? doc.author : clean(info.author);
  if (title === doc.title && author === doc.author) return doc;
  return { ...doc, title, author };
}
