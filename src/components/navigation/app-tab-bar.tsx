import type { BottomTabBarProps } from 'expo-router/js-tabs';
import { Pressable, StyleSheet, View, type ViewStyle } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';
import { useTheme } from '../../theme/theme-provider';
import { useLayout } from '../../theme/use-layout';
import { fonts, radius, space } from '../../theme/tokens';
import { Icon, type IconName } from '../ui/icons';
import { Text } from '../ui/text';

export const MAIN_TABS: { name: string; label: string; icon: IconName; hint: string }[] = [
  { name: 'sift', label: 'Sift', icon: 'sift', hint: 'Type serials and read them' },
  { name: 'hunts', label: 'Hunts', icon: 'hunts', hint: 'Hunts and strap sheets' },
  { name: 'keepers', label: 'Keepers', icon: 'keepers', hint: 'Your pulled notes' },
  { name: 'odds', label: 'Odds', icon: 'odds', hint: 'Rarity table and weights' },
  { name: 'you', label: 'You', icon: 'you', hint: 'Account and data' },
];

/** One component, two shapes: a bottom bar for a thumb, a side rail for a desk. */
export function AppTabBar({ state, navigation }: BottomTabBarProps) {
  const theme = useTheme();
  const { isWide } = useLayout();
  const insets = useSafeAreaInsets();
  const activeName = state.routes[state.index]?.name ?? '';

  const items = MAIN_TABS.map((tab) => {
    const route = state.routes.find((candidate) => candidate.name === tab.name || candidate.name.startsWith(`${tab.name}/`));
    if (!route) return null;
    const focused = activeName === route.name;
    const color = focused ? theme.brand : theme.inkMuted;
    const onPress = () => {
      const event = navigation.emit({ type: 'tabPress', target: route.key, canPreventDefault: true });
      if (!focused && !event.defaultPrevented) navigation.navigate(route.name, route.params);
    };
    return (
      <Pressable
        key={tab.name}
        accessibilityRole="tab"
        accessibilityState={{ selected: focused }}
        accessibilityLabel={tab.label}
        accessibilityHint={tab.hint}
        testID={`tab-${tab.name}`}
        onPress={onPress}
        style={({ hovered }: { hovered?: boolean }) => [
          isWide ? styles.railItem : styles.barItem,
          focused && { backgroundColor: isWide ? theme.surfaceSunken : 'transparent' },
          hovered && !focused && { backgroundColor: theme.surfaceSunken },
        ]}
      >
        {!isWide && focused ? <View style={[styles.barMarker, { backgroundColor: theme.brand }]} /> : null}
        <Icon name={tab.icon} color={color} size={isWide ? 22 : 24} />
        <Text variant={isWide ? 'label' : 'caption'} style={[{ color }, focused && styles.focusedLabel]}>
          {tab.label}
        </Text>
      </Pressable>
    );
  });

  if (isWide) {
    return (
      <View
        role="navigation"
        aria-label="Main"
        testID="side-rail"
        style={[styles.rail, { backgroundColor: theme.surfaceRaised, borderRightColor: theme.line }]}
      >
        <View style={styles.brandRow}>
          <View style={[styles.brandMark, { backgroundColor: theme.brand }]}>
            <Text style={[styles.brandMarkText, { color: theme.onBrand }]}>S</Text>
          </View>
          <Text variant="heading" style={styles.brandName}>
            Strapsift
          </Text>
        </View>
        <View role="tablist" style={styles.railItems}>
          {items}
        </View>
      </View>
    );
  }
  return (
    <View
      role="navigation"
      aria-label="Main"
      testID="tab-bar"
      style={[styles.bar, { backgroundColor: theme.surfaceRaised, borderTopColor: theme.line, paddingBottom: Math.max(insets.bottom, space.xs) }]}
    >
      <View role="tablist" style={styles.barItems}>
        {items}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  bar: { borderTopWidth: 1, paddingTop: space.xs },
  barItems: { flexDirection: 'row' },
  barItem: { flex: 1, alignItems: 'center', justifyContent: 'center', gap: 2, minHeight: 56, position: 'relative' },
  barMarker: { position: 'absolute', top: -space.xs, height: 3, width: 32, borderRadius: 2 },
  focusedLabel: { fontWeight: '700' },
  rail: { width: 220, borderRightWidth: 1, paddingVertical: space.xl, paddingHorizontal: space.md, gap: space.xl, height: '100%' } as ViewStyle,
  railItems: { gap: space.xs },
  railItem: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.md,
    paddingHorizontal: space.md,
    minHeight: 48,
    borderRadius: radius.md,
  },
  brandRow: { flexDirection: 'row', alignItems: 'center', gap: space.sm, paddingHorizontal: space.sm },
  brandMark: { width: 32, height: 32, borderRadius: radius.sm, alignItems: 'center', justifyContent: 'center' },
  brandMarkText: { fontFamily: fonts.monoBold, fontSize: 18 },
  brandName: { letterSpacing: -0.2 },
});
