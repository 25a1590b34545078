/**
 * Four projects, one run:
 *   shared  pure logic (node), ts-jest
 *   server  API through supertest against a real PostgreSQL (DATABASE_URL from scripts/test.sh)
 *   client  components with @testing-library/react-native on jest-expo
 *   e2e     chromium through playwright-core against the built web app served by the real server
 * scripts/test.sh picks the projects and prints the closing "N passed, N failed" line.
 */
const tsJest = ['ts-jest', { tsconfig: 'tsconfig.server.json', diagnostics: { warnOnly: false } }];

module.exports = {
  // Hooks and tests may wait on a database reset or a server start while the other half of the run
  // (scripts/test.sh runs two jest processes side by side) keeps both cores busy.
  testTimeout: 30_000,
  projects: [
    {
      displayName: 'shared',
      testEnvironment: 'node',
      testMatch: ['<rootDir>/__tests__/shared/**/*.test.ts'],
      transform: { '^.+\\.tsx?$': tsJest },
    },
    {
      displayName: 'server',
      testEnvironment: 'node',
      testMatch: ['<rootDir>/__tests__/server/**/*.test.ts'],
      transform: { '^.+\\.tsx?$': tsJest },
    },
    {
      displayName: 'client',
      preset: 'jest-expo',
      testMatch: ['<rootDir>/__tests__/client/**/*.test.tsx'],
      transformIgnorePatterns: [
        'node_modules/(?!((jest-)?react-native|@react-native(-community)?)|expo(nent)?|@expo(nent)?/.*|@expo-google-fonts/.*|react-navigation|@react-navigation/.*|react-native-svg|@tanstack/.*)',
      ],
    },
    {
      displayName: 'e2e',
      testEnvironment: 'node',
      testMatch: ['<rootDir>/__tests__/e2e/**/*.e2e.test.ts'],
      transform: { '^.+\\.tsx?$': tsJest },
    },
  ],
};
