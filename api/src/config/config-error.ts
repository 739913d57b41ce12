export class ConfigError extends Error {}
