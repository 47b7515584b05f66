import { useEffect, useState } from 'react';
import { Image, StyleSheet, View, type ImageStyle, type StyleProp } from 'react-native';
import useSWR from 'swr';
import { Text } from '@/components/ui/text';
import { apiBlob } from '@/lib/api/client';
import { useTheme } from '@/theme/theme-provider';
import { photoKeys } from '../api';

interface PhotoImageProps {
  /** The photo's API path as the server gave it (`/api/keepers/…`). */
  path: string;
  label: string;
  style: StyleProp<ImageStyle>;
  testID?: string;
}

/**
 * A photo only its owner may see: the browser cannot put the session on an <img> request, so the bytes
 * come through the API client and are shown from an object URL, freed when the picture goes.
 */
export function PhotoImage({ path, label, style, testID }: PhotoImageProps) {
  const theme = useTheme();
  const { data: blob, error } = useSWR(photoKeys.bytes(path), ([, apiPath]) => apiBlob(apiPath.replace(/^\/api/, '')), {
    revalidateOnFocus: false,
    revalidateIfStale: false,
  });
  const [url, setUrl] = useState<string | null>(null);
  useEffect(() => {
    if (!blob) return undefined;
    const objectUrl = URL.createObjectURL(blob);
    setUrl(objectUrl);
    return () => URL.revokeObjectURL(objectUrl);
  }, [blob]);
  if (error || !url) {
    return (
      <View style={[style as object, styles.empty, { backgroundColor: theme.surfaceSunken, borderColor: theme.line }]} accessibilityLabel={label}>
        {error ? (
          <Text variant="caption" tone="muted">
            Photo unavailable
          </Text>
        ) : null}
      </View>
    );
  }
  return <Image source={{ uri: url }} style={style} resizeMode="contain" accessibilityLabel={label} testID={testID} />;
}

const styles = StyleSheet.create({
  empty: { alignItems: 'center', justifyContent: 'center', borderWidth: 1 },
});
