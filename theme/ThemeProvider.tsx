import { createContext, useContext, useMemo, type ReactNode } from 'react';
import { useColorScheme, useWindowDimensions } from 'react-native';
import { layout, palettes, type Palette } from './tokens';

export type Theme = { scheme: 'light' | 'dark'; colors: Palette; isWide: boolean };

const ThemeContext = createContext<Theme | null>(null);

/** Supplies colours for the system scheme and whether the window is wide enough for the rail. */
export function ThemeProvider({ children }: { children: ReactNode }) {
  const scheme = useColorScheme() === 'dark' ? 'dark' : 'light';
  const { width } = useWindowDimensions();
  const isWide = width >= layout.wideBreakpoint;
  const value = useMemo<Theme>(() => ({ scheme, colors: palettes[scheme], isWide }), [scheme, isWide]);
  return <ThemeContext.Provider value={value}>{children}</ThemeContext.Provider>;
}

export function useTheme(): Theme {
  const theme = useContext(ThemeContext);
  if (!theme) throw new Error('useTheme must be used inside <ThemeProvider>');
  return theme;
}
