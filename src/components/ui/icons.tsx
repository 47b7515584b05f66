import Svg, { Circle, Path, Rect } from 'react-native-svg';

export type IconName = 'sift' | 'hunts' | 'keepers' | 'odds' | 'you';

interface IconProps {
  name: IconName;
  color: string;
  size?: number;
}

/** Our own line icons, drawn on a 24-unit grid with one stroke weight. */
export function Icon({ name, color, size = 24 }: IconProps) {
  const stroke = { stroke: color, strokeWidth: 1.8, fill: 'none', strokeLinecap: 'round', strokeLinejoin: 'round' } as const;
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" accessibilityElementsHidden importantForAccessibility="no">
      {name === 'sift' ? (
        <>
          {[5, 12, 19].flatMap((x) => [5, 12, 19].map((y) => <Rect key={`${x}-${y}`} x={x - 2} y={y - 2} width={4} height={4} rx={1} {...stroke} />))}
        </>
      ) : null}
      {name === 'hunts' ? (
        <>
          <Rect x={3} y={6} width={18} height={12} rx={2} {...stroke} />
          <Path d="M10 6v12M14 6v12" {...stroke} />
          <Path d="M6 3.5h12" {...stroke} />
        </>
      ) : null}
      {name === 'keepers' ? (
        <>
          <Rect x={3} y={5} width={18} height={14} rx={2} {...stroke} />
          <Path d="M12 8.5l1.2 2.4 2.6.4-1.9 1.8.5 2.6-2.4-1.3-2.4 1.3.5-2.6-1.9-1.8 2.6-.4z" {...stroke} />
        </>
      ) : null}
      {name === 'odds' ? (
        <>
          <Path d="M4 20V10M10 20V4M16 20v-7M22 20H2" {...stroke} />
          <Circle cx={19} cy={6} r={2} {...stroke} />
        </>
      ) : null}
      {name === 'you' ? (
        <>
          <Circle cx={12} cy={8.5} r={4} {...stroke} />
          <Path d="M4 20.5c1.5-4 4.5-5.5 8-5.5s6.5 1.5 8 5.5" {...stroke} />
        </>
      ) : null}
    </Svg>
  );
}
