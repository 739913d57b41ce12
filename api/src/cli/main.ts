import { runLazily } from './command-loaders.js';

process.exitCode = await runLazily(process.argv.slice(2), {
  out: (text) => process.stdout.write(text),
  err: (text) => process.stderr.write(text),
});
