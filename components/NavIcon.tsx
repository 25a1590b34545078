import Svg, { Circle, Path, Rect } from 'react-native-svg';

export type NavIconName = 'discover' | 'garage' | 'activity' | 'profile' | 'bell';

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
      {name === 'bell' ? (
        <>
          <Path d="M6 16.5 V11 C6 7.5 8.5 5 12 5 C15.5 5 18 7.5 18 11 V16.5 L19.5 18 H4.5 Z" {...stroke} />
          <Path d="M10 20.5 C10.5 21.3 11.2 21.7 12 21.7 C12.8 21.7 13.5 21.3 14 20.5" {...stroke} />
          <Path d="M12 3 V5" {...stroke} />
        </>
      ) : null}
      {name === 'profile' ? (
        <>
          <Circle cx={12} cy={8.5} r={4} {...stroke} />
          <Path d="M4 20.5 C5.5 15.5 18.5 15.5 20 20.5" {...stroke} />
        </>
      ) : null}
    </Svg>
  );
}
