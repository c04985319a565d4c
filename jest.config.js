// Two projects: the pure and server code in a Node environment, the components under jest-expo.
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
  ],
};
