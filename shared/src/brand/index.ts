/**
 * Nappe's look as plain data: the palette, the semantic colours and the type, in Chakra's token
 * format. Both apps' themes are built from it (`@nappe/shared/brand`); nothing here imports a
 * framework.
 */
export * from './tokens.js';
export * from './semantic-tokens.js';
