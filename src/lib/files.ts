/** The phone build has no downloads folder or file chooser wired yet: exports and imports are on the web app. */
export async function saveFile(_fileName: string, _blob: Blob): Promise<void> {
  throw new Error('Exports download in the web app.');
}

export async function pickTextFile(_accept: string): Promise<{ name: string; text: string } | null> {
  return null;
}

export async function pickBinaryFile(_accept: string): Promise<File | null> {
  return null;
}

export const canPickFiles = false;
