// One Babel config for the app bundle and for every jest project.
module.exports = function (api) {
  api.cache(true);
  return { presets: ['babel-preset-expo'] };
};
