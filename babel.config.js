// One Babel setup for Metro (the web build) and for Jest.
module.exports = function (api) {
  api.cache(true);
  return {
    presets: ['babel-preset-expo'],
  };
};
