import Svg, { Circle, Path, Rect } from 'react-native-svg';

export type NavIconName = 'discover' | 'garage' | 'activity' | 'profile';

export type NavIconProps = { name: NavIconName; color: string; size?: number };

/** Tunefork's own line icons for the main destinations, drawn on a 24-unit grid. */
export function NavIcon({ name, color, size = 24 }: NavIconProps) {
  const stroke = { stroke: color, strokeWidth: 2, fill: 'none', strokeLinecap: 'round', strokeLinejoin: 'round' } as const;
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" aria-hidden>
      {name === 'discover' ? (
        <>
          <Circle cx={10.5} cy={10.5} r={6.5} {...stroke} />
          <Path d="M15.5 15.5 L21 21" {...stroke} />
          <Path d="M8 12.5 L10 8.5 L13 11" {...stroke} />
        </>
      ) : null}
      {name === 'garage' ? (
        <>
          <Path d="M3 10 L12 4 L21 10 V20 H3 Z" {...stroke} />
          <Rect x={7} y={13} width={10} height={7} {...stroke} />
          <Path d="M7 16.5 H17" {...stroke} />
        </>
      ) : null}
      {name === 'activity' ? <Path d="M2 13 H6 L9 6 L13 19 L16 11 L18 13 H22" {...stroke} /> : null}
      {name === 'profile' ? (
        <>
          <Circle cx={12} cy={8.5} r={4} {...stroke} />
          <Path d="M4 20.5 C5.5 15.5 18.5 15.5 20 20.5" {...stroke} />
        </>
      ) : null}
    </Svg>
  );
}
