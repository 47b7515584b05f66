import { StyleSheet } from 'react-native';
import { Text, type TextProps } from './text';

/**
 * The one level-one heading of a screen. `hidden` keeps it for screen readers only, for screens
 * whose look has no title (the keypad), so every screen still names itself once.
 */
export function PageHeading({ hidden, style, ...rest }: TextProps & { hidden?: boolean }) {
  return <Text variant="title" role="heading" aria-level={1} style={[hidden && styles.hidden, style]} {...rest} />;
}

const styles = StyleSheet.create({
  // The usual visually-hidden recipe: out of the layout, still in the accessibility tree.
  hidden: { position: 'absolute', width: 1, height: 1, margin: -1, padding: 0, overflow: 'hidden', borderWidth: 0, opacity: 0 },
});
