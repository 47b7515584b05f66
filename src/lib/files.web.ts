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
export function pickTextFile(accept: string): Promise<{ name: string; text: string } | null> {
  return new Promise((resolve, reject) => {
    const input = document.createElement('input');
    input.type = 'file';
    input.accept = accept;
    input.style.display = 'none';
    input.setAttribute('data-testid', 'text-file-input');
    document.body.appendChild(input);
    const done = () => input.remove();
    input.addEventListener('change', () => {
      const file = input.files?.[0];
      done();
      if (!file) {
        resolve(null);
        return;
      }
      file.text().then((text) => resolve({ name: file.name, text }), reject);
    });
    input.addEventListener('cancel', () => {
      done();
      resolve(null);
    });
    input.click();
  });
}

export const canPickFiles = true;
