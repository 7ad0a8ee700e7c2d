/**
 * zod's full import also re-exports every message locale (about 40 languages). Faintline
 * speaks English only, so for the web bundle that namespace points at the English locale.
 */
const ZOD_WITH_LOCALES = /node_modules[\\/]zod[\\/]v4[\\/](classic[\\/]external|core[\\/]index)\.c?js$/;
const LOCALES_INDEX = /^\.\.\/locales\/index\.(c?js)$/;

function zodEnglishOnly() {
  // Only a check per node: skipping the program would skip the preset's own transforms too.
  const retarget = (state, literal) => {
    if (!ZOD_WITH_LOCALES.test(state.filename ?? '')) return;
    const match = literal && LOCALES_INDEX.exec(literal.value);
    if (match) literal.value = `../locales/en.${match[1]}`;
  };
  return {
    name: 'zod-english-only',
    visitor: {
      ExportAllDeclaration(path, state) {
        retarget(state, path.node.source);
      },
      ExportNamedDeclaration(path, state) {
        retarget(state, path.node.source);
      },
      CallExpression(path, state) {
        if (path.node.callee.name === 'require' && path.node.arguments[0]?.type === 'StringLiteral')
          retarget(state, path.node.arguments[0]);
      },
    },
  };
}

module.exports = function (api) {
  api.cache(true);
  return { presets: ['babel-preset-expo'], plugins: [zodEnglishOnly] };
};
