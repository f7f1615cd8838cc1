/* Builds the Excel add-in: dist/functions.js, dist/functions.html, dist/functions.json, assets. */
const path = require('node:path');
const HtmlWebpackPlugin = require('html-webpack-plugin');
const CopyWebpackPlugin = require('copy-webpack-plugin');
const tsx = require('tsx/cjs/api');
const webpack = require('webpack');
const withoutHelpText = require('./scripts/without-help-text.cjs');

const DEV_ORIGIN = 'https://localhost:3000';

/** Emits functions.json from the same declarations the bundle registers. */
class FunctionsJsonPlugin {
  apply(compiler) {
    compiler.hooks.thisCompilation.tap('FunctionsJsonPlugin', (compilation) => {
      compilation.hooks.processAssets.tap(
        { name: 'FunctionsJsonPlugin', stage: compiler.webpack.Compilation.PROCESS_ASSETS_STAGE_ADDITIONAL },
        () => {
          // Read fresh each build so `npm run serve` picks up edited declarations.
          const { functionsJson } = tsx.require('./src/cells/metadata.ts', __filename);
          const { catalog } = tsx.require('./src/cells/catalog.ts', __filename);
          const json = JSON.stringify(functionsJson(catalog), null, 2) + '\n';
          compilation.emitAsset('functions.json', new compiler.webpack.sources.RawSource(json));
        },
      );
    });
  }
}

/**
 * The adapter's column loop written out once for each `each` function, as a code fragment for
 * FLUXBOOK_COLUMN_LOOPS: V8 keeps call-site feedback per function in the source, so a loop of its
 * own lets each function's compute be inlined. The engine compiles such copies at run time; the
 * add-in's bundle may not, so the build writes them.
 */
function columnLoopCopies() {
  const { numberColumnLoop } = tsx.require('./src/cells/adapter.ts', __filename);
  const { catalog } = tsx.require('./src/cells/catalog.ts', __filename);
  const count = catalog.filter((decl) => decl.kind === 'each').length;
  return `[${Array.from({ length: count }, () => `(${numberColumnLoop.toString()})`).join(',\n')}]`;
}

async function httpsOptions() {
  try {
    const devCerts = require('office-addin-dev-certs');
    return await devCerts.getHttpsServerOptions();
  } catch (error) {
    // Where the Office developer certificates cannot be installed (Linux, CI), serve with the
    // dev server's own self-signed certificate so the bundle can still be checked over HTTPS.
    console.warn(`office-addin-dev-certs unavailable (${error.message}); using a self-signed certificate`);
    return undefined;
  }
}

module.exports = async (env, argv) => {
  const dev = argv.mode !== 'production';
  const serving = Boolean(process.env.WEBPACK_SERVE);
  return {
    mode: dev ? 'development' : 'production',
    target: ['web', 'es2020'],
    devtool: dev ? 'source-map' : false,
    entry: { functions: './src/excel/functions.ts' },
    output: { path: path.resolve(__dirname, 'dist'), filename: '[name].js', clean: true },
    resolve: { extensions: ['.ts', '.js'] },
    module: {
      rules: [
        {
          test: /\.ts$/,
          exclude: /node_modules/,
          use: {
            loader: 'ts-loader',
            // The help texts go to Excel in functions.json; the bundle has no use for them.
            options: { configFile: 'tsconfig.build.json', getCustomTransformers: (program) => ({ before: [withoutHelpText(program)] }) },
          },
        },
      ],
    },
    plugins: [
      new FunctionsJsonPlugin(),
      new webpack.DefinePlugin({
        // Worked out again on every compilation: it depends on the loop and on every declaration.
        FLUXBOOK_COLUMN_LOOPS: webpack.DefinePlugin.runtimeValue(columnLoopCopies, true),
      }),
      new HtmlWebpackPlugin({ filename: 'functions.html', template: './src/excel/functions.html', chunks: ['functions'], inject: 'body' }),
      new CopyWebpackPlugin({ patterns: [{ from: 'assets/*.png', to: 'assets/[name][ext]' }] }),
    ],
    performance: { hints: false },
    devServer: serving
      ? {
          port: 3000,
          headers: { 'Access-Control-Allow-Origin': '*' },
          server: { type: 'https', options: await httpsOptions() },
          static: { directory: path.resolve(__dirname, 'dist') },
          client: false,
          hot: false,
          liveReload: false,
        }
      : undefined,
  };
};
module.exports.DEV_ORIGIN = DEV_ORIGIN;
