/** Downloads a text file built in the browser, under the given name. */
export async function saveTextFile(fileName: string, text: string, mimeType = 'text/csv'): Promise<void> {
  const url = URL.createObjectURL(new Blob([text], { type: `${mimeType};charset=utf-8` }));
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  link.style.display = 'none';
  document.body.appendChild(link);
  link.click();
  link.remove();
  // Revoked on the next turn: some browsers read the URL after click() returns.
  setTimeout(() => URL.revokeObjectURL(url), 0);
}
