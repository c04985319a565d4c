// Metro for the web export, with Expo's tree shaking so that only the parts of a package the app
// imports end up in the bundle (mathjs alone is most of a megabyte otherwise).
const { getDefaultConfig } = require('expo/metro-config');

// Expo reads these flags from the environment when it bundles; setting them here makes every
// export the same, whether it comes from `npm run build`, `npm start` or the browser tests.
process.env.EXPO_UNSTABLE_METRO_OPTIMIZE_GRAPH = '1';
process.env.EXPO_UNSTABLE_TREE_SHAKING = '1';

const config = getDefaultConfig(__dirname);

config.transformer.getTransformOptions = async () => ({
  transform: { experimentalImportSupport: true },
});

module.exports = config;
