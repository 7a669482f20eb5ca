// The reference app of `npm run bench:web`: the same preset as the product.
module.exports = (api) => {
  api.cache(true);
  return { presets: ['babel-preset-expo'] };
};
