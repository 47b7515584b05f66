/** Hands a file to the browser as a download; nothing else leaves the device. */
export async function saveFile(fileName: string, blob: Blob): Promise<void> {
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

/** Opens the browser's file chooser for one text file; null when the visitor cancels. */
export async function pickTextFile(accept: string): Promise<{ name: string; text: string } | null> {
  const file = await pickBinaryFile(accept, 'text-file-input');
  return file ? { name: file.name, text: await file.text() } : null;
}

/** Opens the browser's file chooser for one file of any kind (an archive), as the File itself. */
export function pickBinaryFile(accept: string, testId = 'binary-file-input'): Promise<File | null> {
  return new Promise((resolve) => {
    const input = document.createElement('input');
    input.type = 'file';
    input.accept = accept;
    input.style.display = 'none';
    input.setAttribute('data-testid', testId);
    document.body.appendChild(input);
    input.addEventListener('change', () => {
      const file = input.files?.[0] ?? null;
      input.remove();
      resolve(file);
    });
    input.addEventListener('cancel', () => {
      input.remove();
      resolve(null);
    });
    input.click();
  });
}

export const canPickFiles = true;
