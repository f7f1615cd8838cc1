/* Builds the command line: dist/cli/fluxbook.js for Node (the add-in build is webpack.config.js). */
const path = require('node:path');
const fs = require('node:fs');
const { BannerPlugin, optimize } = require('webpack');

/** Makes the script runnable as `./dist/cli/fluxbook.js` too (npm links the bin itself). */
class ExecutablePlugin {
  apply(compiler) {
    compiler.hooks.afterEmit.tap('ExecutablePlugin', () => {
      fs.chmodSync(path.resolve(__dirname, 'dist/cli/fluxbook.js'), 0o755);
    });
  }
}

module.exports = (env, argv) => ({
  mode: argv.mode === 'development' ? 'development' : 'production',
  target: 'node20',
  devtool: false,
  entry: { fluxbook: './src/cli/fluxbook.ts' },
  output: { path: path.resolve(__dirname, 'dist/cli'), filename: '[name].js', clean: true },
  resolve: { extensions: ['.ts', '.js'] },
  // Packages stay in node_modules (they are the package's dependencies); only our code is bundled.
  // saxen is published as an ES module only: it is bundled in, so that `require` on Node 20 needs no flag.
  externals: [({ request }, callback) => (/^[a-z@][^:]*$/i.test(request) && !request.startsWith('.') && request !== 'saxen' ? callback(null, `commonjs ${request}`) : callback())],
  externalsPresets: { node: true },
  module: {
    rules: [{ test: /\.ts$/, exclude: /node_modules/, use: { loader: 'ts-loader', options: { configFile: 'tsconfig.cli.json' } } }],
  },
  optimization: { minimize: false },
  plugins: [
    new BannerPlugin({ banner: '#!/usr/bin/env node', raw: true, entryOnly: true }),
    // One file: modules loaded with import() (the demo writer) are bundled in, and run when first needed.
    new optimize.LimitChunkCountPlugin({ maxChunks: 1 }),
    new ExecutablePlugin(),
  ],
  performance: { hints: false },
});
