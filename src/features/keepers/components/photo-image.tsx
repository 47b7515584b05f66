import { Image, type ImageStyle, type StyleProp } from 'react-native';
import { authedImageSource } from '@/lib/api/client';

interface PhotoImageProps {
  /** The photo's API path as the server gave it (`/api/keepers/…`). */
  path: string;
  label: string;
  style: StyleProp<ImageStyle>;
  testID?: string;
}

/** On a phone the image request itself carries the session header. */
export function PhotoImage({ path, label, style, testID }: PhotoImageProps) {
  return <Image source={authedImageSource(path)} style={style} resizeMode="contain" accessibilityLabel={label} testID={testID} />;
}
