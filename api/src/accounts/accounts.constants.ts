/** Injection token of the one-time links' settings (config/accounts-config.ts, LinksConfig). */
export const LINKS_CONFIG = Symbol('LINKS_CONFIG');
