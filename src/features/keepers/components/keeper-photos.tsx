import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import * as ImagePicker from 'expo-image-picker';
import { PHOTO_MAX_BYTES, type PhotoSide, type PhotoView } from '@shared/contracts';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { useSubmit } from '@/lib/api/use-submit';
import { useTheme } from '@/theme/theme-provider';
import { radius, space } from '@/theme/tokens';
import { deletePhoto, uploadPhoto } from '../api';
import { PHOTO_CAUTION } from '../photo-caution';
import { photoForm } from '../photo-form';
import { PhotoImage } from './photo-image';

const SIDES: { side: PhotoSide; label: string }[] = [
  { side: 'front', label: 'Front' },
  { side: 'back', label: 'Back' },
];

function PhotoSlot({ keeperId, side, label, photo }: { keeperId: string; side: PhotoSide; label: string; photo: PhotoView | undefined }) {
  const theme = useTheme();
  const [confirming, setConfirming] = useState(false);
  const upload = useSubmit(async () => {
    const picked = await ImagePicker.launchImageLibraryAsync({ mediaTypes: ['images'], allowsMultipleSelection: false, quality: 1 });
    if (picked.canceled || !picked.assets?.[0]) return;
    const asset = picked.assets[0];
    if (asset.fileSize && asset.fileSize > PHOTO_MAX_BYTES) {
      upload.setMessage('That photo is over 10 MB; pick a smaller one.');
      return;
    }
    await uploadPhoto(keeperId, side, photoForm(asset));
  });
  const removal = useSubmit(async () => {
    if (!photo) return;
    await deletePhoto(keeperId, photo.id);
    setConfirming(false);
  });
  return (
    <View style={styles.slot} testID={`photo-slot-${side}`}>
      <Text variant="label" tone="muted">
        {label.toUpperCase()}
      </Text>
      {photo ? (
        <PhotoImage path={photo.url} label={`${label} of the note`} style={styles.image} testID={`photo-${side}`} />
      ) : (
        <View style={[styles.image, styles.empty, { borderColor: theme.line, backgroundColor: theme.surfaceSunken }]}>
          <Text variant="caption" tone="muted">
            No {label.toLowerCase()} photo
          </Text>
        </View>
      )}
      {upload.message ? <Notice tone="error">{upload.message}</Notice> : null}
      <View style={styles.actions}>
        <Button
          compact
          kind="secondary"
          label={photo ? `Replace ${label.toLowerCase()}` : `Add ${label.toLowerCase()}`}
          busy={upload.busy}
          onPress={() => void upload.submit()}
          testID={`photo-add-${side}`}
        />
        {photo ? <Button compact kind="quiet" label="Remove" accessibilityLabel={`Remove the ${label.toLowerCase()} photo`} onPress={() => setConfirming(true)} /> : null}
      </View>
      <ConfirmDialog
        visible={confirming}
        title={`Remove the ${label.toLowerCase()} photo?`}
        message="The picture is deleted from Strapsift's photo store. The keeper stays."
        confirmLabel="Remove photo"
        danger
        busy={removal.busy}
        error={removal.message}
        onConfirm={() => void removal.submit()}
        onCancel={() => setConfirming(false)}
        testID={`photo-remove-${side}`}
      />
    </View>
  );
}

/** Front and back photos of a keeper, with the caution about pictures of currency where they are added. */
export function KeeperPhotos({ keeperId, photos }: { keeperId: string; photos: readonly PhotoView[] }) {
  return (
    <Card testID="keeper-photos">
      <Text variant="label" tone="muted">
        PHOTOS
      </Text>
      <Notice tone="caution" title="Photos of currency">
        {PHOTO_CAUTION}
      </Notice>
      <View style={styles.slots}>
        {SIDES.map(({ side, label }) => (
          <PhotoSlot key={side} keeperId={keeperId} side={side} label={label} photo={photos.find((photo) => photo.side === side)} />
        ))}
      </View>
      <Text variant="caption" tone="faint">
        JPEG, PNG or WebP, up to 10 MB. Location and camera details are removed when a photo is stored.
      </Text>
    </Card>
  );
}

const styles = StyleSheet.create({
  slots: { gap: space.lg },
  slot: { flex: 1, gap: space.sm, minWidth: 0 },
  // Notes are about 2.35 times as wide as they are tall.
  image: { width: '100%', aspectRatio: 2.35, borderRadius: radius.sm },
  empty: { borderWidth: 1, borderStyle: 'dashed', alignItems: 'center', justifyContent: 'center' },
  actions: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap', alignItems: 'center' },
});
