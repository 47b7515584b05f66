import { Pressable, StyleSheet, View } from 'react-native';
import { Text } from '@/components/ui/text';
import { useTheme } from '@/theme/theme-provider';
import { fonts, radius } from '@/theme/tokens';
import { NOTES_PER_STRAP } from '../strap-count';

interface StrapBarProps {
  strap: number;
  inStrap: number;
  onPrevious(): void;
  onNext(): void;
}

/** "strap 3 · 37 of 100" with a bar, and steppers for a hunter who changes straps by hand. */
export function StrapBar({ strap, inStrap, onPrevious, onNext }: StrapBarProps) {
  const theme = useTheme();
  const share = Math.min(1, inStrap / NOTES_PER_STRAP);
  return (
    <View style={styles.wrap}>
      <View style={styles.row}>
        <Pressable accessibilityRole="button" accessibilityLabel="Previous strap" onPress={onPrevious} disabled={strap <= 1} style={styles.step} hitSlop={8}>
          <Text tone={strap <= 1 ? 'faint' : 'brand'} bold>
            ‹
          </Text>
        </Pressable>
        <Text style={styles.text} numberOfLines={1} accessibilityLabel={`Strap ${strap}, ${inStrap} of ${NOTES_PER_STRAP} notes`} testID="strap-progress">
          strap {strap} · {inStrap} of {NOTES_PER_STRAP}
        </Text>
        <Pressable accessibilityRole="button" accessibilityLabel="Next strap" onPress={onNext} style={styles.step} hitSlop={8}>
          <Text tone="brand" bold>
            ›
          </Text>
        </Pressable>
      </View>
      <View style={[styles.track, { backgroundColor: theme.surfaceSunken }]}>
        <View style={[styles.fill, { width: `${share * 100}%`, backgroundColor: theme.brand }]} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: 4, flex: 1, minWidth: 150 },
  row: { flexDirection: 'row', alignItems: 'center', gap: 2 },
  // One line on a 390 px phone beside the Camera and Undo buttons, up to "strap 40 · 100 of 100".
  text: { fontFamily: fonts.monoMedium, fontSize: 13, fontVariant: ['tabular-nums'], flexShrink: 1 },
  step: { paddingHorizontal: 2, minWidth: 24, alignItems: 'center' },
  track: { height: 4, borderRadius: radius.pill, overflow: 'hidden' },
  fill: { height: 4, borderRadius: radius.pill },
});
