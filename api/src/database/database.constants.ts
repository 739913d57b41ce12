export const KNEX = Symbol('KNEX');
