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
      // The native preset, so Testing Library's queries see host components; what only the
      // browser shows is covered by the browser tests in test/e2e.
      preset: 'jest-expo/ios',
      testMatch: ['<rootDir>/test/{src,app}/**/*.test.ts?(x)'],
      moduleNameMapper,
    },
    {
      displayName: 'e2e',
      testEnvironment: 'node',
      testMatch: ['<rootDir>/test/e2e/**/*.test.ts'],
      transform: { '^.+\\.[jt]sx?$': 'babel-jest' },
      moduleNameMapper,
      setupFilesAfterEnv: ['<rootDir>/test/e2e/setup.ts'],
    },
  ],
};
