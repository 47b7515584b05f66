import type { ImagePickerAsset } from 'expo-image-picker';

/** React Native's FormData takes a file as { uri, name, type } and streams it from the device. */
export function photoForm(asset: ImagePickerAsset): FormData {
  const form = new FormData();
  form.append('photo', { uri: asset.uri, name: asset.fileName ?? 'photo.jpg', type: asset.mimeType ?? 'image/jpeg' } as unknown as Blob);
  return form;
}
