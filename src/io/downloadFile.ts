// Hands a file to the browser's download (an object URL on a temporary link; nothing leaves the machine).

/** Starts the download of the blob under the file name and releases the URL afterwards. */
export function downloadFile(blob: Blob, fileName: string): void {
  const url = URL.createObjectURL(blob);
  const a = document.createElement('a');
  a.href = url;
  a.download = fileName;
  a.rel = 'noopener';
  document.body.appendChild(a);
  a.click();
  a.remove();
  window.setTimeout(() => URL.revokeObjectURL(url), 30_000);
}

/** Returns a file name made from a title: letters, digits, dashes and dots only, never empty. */
export function safeFileName(title: string, extension: string): string {
  const base = title.normalize('NFKD').replace(/[^\w.-]+/g, '-').replace(/^[-.]+|[-.]+$/g, '').slice(0, 80) || 'section';
  return `${base}${extension}`;
}
