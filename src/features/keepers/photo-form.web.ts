import type { ImagePickerAsset } from 'expo-image-picker';

/** In the browser the picker hands over the File itself; it goes into the form as is. */
export function photoForm(asset: ImagePickerAsset): FormData {
  const form = new FormData();
  if (!asset.file) throw new Error('The picked photo has no file');
  form.append('photo', asset.file, asset.fileName ?? asset.file.name);
  return form;
}
