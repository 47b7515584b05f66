import { useState } from 'react';
import { StyleSheet, View, type LayoutChangeEvent } from 'react-native';
import Svg, { Line, Rect, Text as SvgText } from 'react-native-svg';
import { useTheme } from '../../theme/theme-provider';
import { fonts, fontSize } from '../../theme/tokens';

export interface BarDatum {
  key: string;
  /** Short text under the bar (a date, a hunt's short name). */
  label: string;
  value: number;
}

interface BarChartProps {
  data: readonly BarDatum[];
  /** One sentence a screen reader reads instead of the drawing, e.g. the highest and lowest bars. */
  summary: string;
  formatValue(value: number): string;
  /** A dashed line across the bars, such as the average over the period. */
  reference?: { value: number; label: string };
  height?: number;
  testID?: string;
}

// Wide enough for a top label such as "428.57" in the mono face.
const AXIS = 60;
const LABEL_ROOM = 22;
// Room above the plot for the reference line's key, so it never sits on a bar.
const TOP = 24;

/**
 * Vertical bars in the theme's colours. The drawing is hidden from screen readers; the summary
 * stands in for it, and every screen that uses it shows the same numbers in a table beside it.
 */
export function BarChart({ data, summary, formatValue, reference, height = 180, testID }: BarChartProps) {
  const theme = useTheme();
  // A sensible first width, corrected by the first layout pass (tests and first paint use it as is).
  const [width, setWidth] = useState(320);
  const onLayout = (event: LayoutChangeEvent) => {
    const next = Math.round(event.nativeEvent.layout.width);
    if (next > 0 && next !== width) setWidth(next);
  };

  const top = Math.max(reference?.value ?? 0, ...data.map((d) => d.value), 0);
  const scaleMax = top > 0 ? top * 1.1 : 1;
  const plotWidth = Math.max(width - AXIS - 4, 10);
  const plotHeight = height - TOP - LABEL_ROOM;
  const slot = data.length ? plotWidth / data.length : plotWidth;
  const barWidth = Math.max(Math.min(slot * 0.7, 48), 2);
  const y = (value: number) => TOP + plotHeight - (value / scaleMax) * plotHeight;
  // Labels are thinned so they never overlap: roughly one every 56 px.
  const labelEvery = Math.max(1, Math.ceil(56 / Math.max(slot, 1)));

  return (
    <View onLayout={onLayout} role="img" aria-label={summary} testID={testID} style={styles.wrap}>
      <Svg width={width} height={height} accessibilityElementsHidden importantForAccessibility="no-hide-descendants">
        <Line x1={AXIS} x2={width} y1={y(0)} y2={y(0)} stroke={theme.line} strokeWidth={1} />
        <SvgText x={AXIS - 6} y={y(0)} fill={theme.inkFaint} fontSize={fontSize.xs} fontFamily={fonts.mono} textAnchor="end">
          0
        </SvgText>
        {top > 0 ? (
          <>
            <Line x1={AXIS} x2={width} y1={y(top)} y2={y(top)} stroke={theme.line} strokeWidth={1} strokeDasharray="2 4" />
            <SvgText x={AXIS - 6} y={y(top) + 4} fill={theme.inkFaint} fontSize={fontSize.xs} fontFamily={fonts.mono} textAnchor="end">
              {formatValue(top)}
            </SvgText>
          </>
        ) : null}
        {data.map((datum, index) => {
          const x = AXIS + index * slot + (slot - barWidth) / 2;
          const barTop = y(datum.value);
          return (
            <Rect
              key={datum.key}
              x={x}
              y={barTop}
              width={barWidth}
              height={Math.max(y(0) - barTop, datum.value > 0 ? 1 : 0)}
              rx={2}
              fill={theme.brand}
            />
          );
        })}
        {data.map((datum, index) =>
          index % labelEvery === 0 ? (
            <SvgText
              key={`label-${datum.key}`}
              x={AXIS + index * slot + slot / 2}
              y={height - 6}
              fill={theme.inkMuted}
              fontSize={fontSize.xs}
              fontFamily={fonts.mono}
              textAnchor="middle"
            >
              {datum.label}
            </SvgText>
          ) : null,
        )}
        {reference && reference.value > 0 ? (
          <>
            <Line
              x1={AXIS}
              x2={width}
              y1={y(reference.value)}
              y2={y(reference.value)}
              stroke={theme.hit}
              strokeWidth={1.5}
              strokeDasharray="6 4"
            />
            <Line x1={width - 150} x2={width - 126} y1={8} y2={8} stroke={theme.hit} strokeWidth={1.5} strokeDasharray="6 4" />
            <SvgText x={width - 120} y={12} fill={theme.hit} fontSize={fontSize.xs} fontFamily={fonts.mono} textAnchor="start">
              {reference.label}
            </SvgText>
          </>
        ) : null}
      </Svg>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { width: '100%' },
});
