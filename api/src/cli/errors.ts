/** Bad input from the user: the command exits with code 2 and this one-line reason. */
export class CliInputError extends Error {
  override readonly name = 'CliInputError';
}
