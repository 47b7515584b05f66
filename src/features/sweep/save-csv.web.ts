/** Hands the CSV to the browser as a download; nothing leaves the device. */
export async function saveCsv(fileName: string, csv: string): Promise<void> {
  const blob = new Blob([csv], { type: 'text/csv;charset=utf-8' });
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  link.style.display = 'none';
  document.body.appendChild(link);
  link.click();
  link.remove();
  // The download has started by now; a later revoke frees the memory without cutting it short.
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}
