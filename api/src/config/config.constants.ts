export const APP_CONFIG = Symbol('APP_CONFIG');
