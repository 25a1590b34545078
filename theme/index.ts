export * from './tokens';
export * from './ThemeProvider';
