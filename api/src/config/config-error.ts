/** A missing or malformed setting: the server stops with this message. */
export class ConfigError extends Error {}
