// Metro and Jest share this config. babel-preset-expo handles TypeScript and the `@/` alias comes from tsconfig paths.
module.exports = function (api) {
  api.cache(true);
  return {
    presets: ['babel-preset-expo'],
  };
};
