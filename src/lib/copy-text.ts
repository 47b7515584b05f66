import { Share } from 'react-native';

/** A phone has the share sheet, which offers "Copy" among its choices. */
export async function copyText(text: string): Promise<boolean> {
  await Share.share({ message: text });
  return true;
}
