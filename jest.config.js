// The pure and server code run in Node, the components under jest-expo, and the browser tests in
// Node driving Chromium against the real server.
const moduleNameMapper = {
  '^@/(.*)$': '<rootDir>/src/$1',
  '^@shared/(.*)$': '<rootDir>/shared/$1',
};

module.exports = {
  projects: [
    {
      displayName: 'node',
      testEnvironment: 'node',
      testMatch: ['<rootDir>/test/{shared,server}/**/*.test.ts'],
      transform: { '^.+\\.[jt]sx?$': 'babel-jest' },
      transformIgnorePatterns: ['/node_modules/(?!(odex)/)'],
      moduleNameMapper,
    },
    {
      displayName: 'app',
      preset: 'jest-expo/web',
      testMatch: ['<rootDir>/test/{src,app}/**/*.test.tsx'],
      moduleNameMapper,
    },
    {
      displayName: 'e2e',
      testEnvironment: 'node',
      testMatch: ['<rootDir>/test/e2e/**/*.test.ts'],
      transform: { '^.+\\.[jt]sx?$': 'babel-jest' },
      moduleNameMapper,
      testTimeout: 120000,
    },
  ],
};
