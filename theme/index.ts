export * from './tokens';
export * from './ThemeProvider';
export * from './pill';
