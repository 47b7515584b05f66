// babel-preset-expo brings the Expo Router and Reanimated transforms; nothing else is needed.
module.exports = function babelConfig(api) {
  api.cache(true);
  return { presets: ['babel-preset-expo'] };
};
