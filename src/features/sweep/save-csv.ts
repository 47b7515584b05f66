import { Share } from 'react-native';

/** A phone has no downloads folder to drop a file in: the CSV goes to the share sheet as text. */
export async function saveCsv(fileName: string, csv: string): Promise<void> {
  await Share.share({ title: fileName, message: csv });
}
