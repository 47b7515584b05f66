import { StyleSheet, Text as NativeText, type TextProps as NativeTextProps } from 'react-native';
import { useTheme } from '../../theme/theme-provider';
import { fonts, fontSize } from '../../theme/tokens';

type Variant = 'title' | 'heading' | 'body' | 'label' | 'caption' | 'mono' | 'digits';
type Tone = 'ink' | 'muted' | 'faint' | 'hit' | 'near' | 'ok' | 'warn' | 'danger' | 'brand' | 'onBrand';

export interface TextProps extends NativeTextProps {
  variant?: Variant;
  tone?: Tone;
  bold?: boolean;
}

const toneKey = {
  ink: 'ink',
  muted: 'inkMuted',
  faint: 'inkFaint',
  hit: 'hit',
  near: 'near',
  ok: 'ok',
  warn: 'warn',
  danger: 'danger',
  brand: 'brand',
  onBrand: 'onBrand',
} as const;

export function Text({ variant = 'body', tone = 'ink', bold, style, ...rest }: TextProps) {
  const theme = useTheme();
  return (
    <NativeText
      {...rest}
      style={[styles[variant], { color: theme[toneKey[tone]] }, bold && styles.bold, style]}
    />
  );
}

const styles = StyleSheet.create({
  title: { fontSize: fontSize.xl, fontWeight: '700', letterSpacing: -0.3 },
  heading: { fontSize: fontSize.lg, fontWeight: '600' },
  body: { fontSize: fontSize.md, lineHeight: 22 },
  label: { fontSize: fontSize.sm, fontWeight: '600', letterSpacing: 0.2 },
  caption: { fontSize: fontSize.xs, lineHeight: 16 },
  mono: { fontFamily: fonts.mono, fontSize: fontSize.md, fontVariant: ['tabular-nums'] },
  digits: { fontFamily: fonts.monoMedium, fontSize: fontSize.xxl, fontVariant: ['tabular-nums'] },
  bold: { fontWeight: '700' },
});
