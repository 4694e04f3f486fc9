// @ts-check
/**
 * Reading the SDK's form bodies. The SDK sends `application/x-www-form-urlencoded` with
 * bracketed keys (`line_items[0][price_data][unit_amount]=1250`) and every value a string;
 * `qs` rebuilds the nesting, and each endpoint converts the fields the API reference types
 * as integers or booleans — metadata values stay strings.
 */
import qs from 'qs';
import { invalidRequest, missingParam } from './stripe-errors.js';
import { isKnownCurrency } from './money.js';

/** @typedef {Record<string, unknown>} Params */

/**
 * @param {string} text raw body or query string (without the leading `?`)
 * @returns {Params}
 */
export function parseForm(text) {
  return /** @type {Params} */ (qs.parse(text, { depth: 10, arrayLimit: 1000 }));
}

/**
 * @param {unknown} value
 * @returns {value is Params}
 */
export function isRecord(value) {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

/**
 * @param {Params} params
 * @param {string} key
 * @param {string} name the parameter's name as the API reference writes it
 * @returns {string | undefined}
 */
export function optionalString(params, key, name = key) {
  const value = params[key];
  if (value === undefined || value === '') return undefined;
  if (typeof value !== 'string') throw invalidRequest(`Invalid string: ${name}`, name);
  return value;
}

/**
 * @param {Params} params
 * @param {string} key
 * @param {string} name
 * @returns {string}
 */
export function requiredString(params, key, name = key) {
  if (params[key] === '') {
    throw invalidRequest(
      `You passed an empty string for '${name}'. We assume empty values are an attempt to unset a parameter; however '${name}' cannot be unset. You should remove '${name}' from your request or supply a non-empty value.`,
      name,
      'parameter_invalid_empty',
    );
  }
  const value = optionalString(params, key, name);
  if (value === undefined) throw missingParam(name);
  return value;
}

/**
 * @param {Params} params
 * @param {string} key
 * @param {string} name
 * @param {{ min?: number, max?: number }} [range]
 * @returns {number | undefined}
 */
export function optionalInteger(params, key, name = key, range = {}) {
  const value = params[key];
  if (value === undefined || value === '') return undefined;
  if (typeof value !== 'string' || !/^-?\d+$/.test(value) || !Number.isSafeInteger(Number(value))) {
    throw invalidRequest(`Invalid integer: ${String(value)}`, name, 'parameter_invalid_integer');
  }
  // "-0" is zero.
  const number = Number(value) === 0 ? 0 : Number(value);
  if (range.min !== undefined && number < range.min) {
    throw invalidRequest(
      `This value must be greater than or equal to ${range.min}.`,
      name,
      'parameter_invalid_integer',
    );
  }
  if (range.max !== undefined && number > range.max) {
    throw invalidRequest(
      `This value must be less than or equal to ${range.max}.`,
      name,
      'parameter_invalid_integer',
    );
  }
  return number;
}

/**
 * @param {Params} params
 * @param {string} key
 * @param {string} name
 * @param {{ min?: number, max?: number }} [range]
 * @returns {number}
 */
export function requiredInteger(params, key, name = key, range = {}) {
  const value = optionalInteger(params, key, name, range);
  if (value === undefined) throw missingParam(name);
  return value;
}

/**
 * @param {Params} params
 * @param {string} key
 * @param {string} name
 * @returns {boolean | undefined}
 */
export function optionalBoolean(params, key, name = key) {
  const value = params[key];
  if (value === undefined || value === '') return undefined;
  if (value === 'true') return true;
  if (value === 'false') return false;
  throw invalidRequest(`Invalid boolean: ${String(value)}`, name);
}

/**
 * Metadata: up to 50 keys, key up to 40 characters, value up to 500 characters, values
 * strings (Stripe API reference, "Metadata").
 * @param {Params} params
 * @param {string} key
 * @param {string} name
 * @returns {Record<string, string>}
 */
export function metadataParam(params, key, name = key) {
  const value = params[key];
  if (value === undefined || value === '') return {};
  if (!isRecord(value)) throw invalidRequest(`Invalid object`, name);
  const entries = Object.entries(value);
  if (entries.length > 50) {
    throw invalidRequest('Metadata can have at most 50 keys.', name);
  }
  /** @type {Record<string, string>} */
  const out = {};
  for (const [k, v] of entries) {
    if (typeof v !== 'string')
      throw invalidRequest(`Invalid string: ${name}[${k}]`, `${name}[${k}]`);
    if (k.length > 40) {
      throw invalidRequest(`Metadata keys can be at most 40 characters long.`, `${name}[${k}]`);
    }
    if (v.length > 500) {
      throw invalidRequest(`Metadata values can be at most 500 characters long.`, `${name}[${k}]`);
    }
    // An empty value unsets the key.
    if (v !== '') out[k] = v;
  }
  return out;
}

/**
 * @param {Params} params
 * @param {string} key
 * @param {string} name
 * @returns {string}
 */
export function currencyParam(params, key, name = key) {
  const value = requiredString(params, key, name).toLowerCase();
  if (!/^[a-z]{3}$/.test(value) || !isKnownCurrency(value)) {
    throw invalidRequest(`Invalid currency: ${value}.`, name);
  }
  return value;
}

/**
 * An absolute http(s) URL, or undefined when absent.
 * @param {Params} params
 * @param {string} key
 * @returns {string | undefined}
 */
export function urlParam(params, key) {
  const value = optionalString(params, key);
  if (value === undefined) return undefined;
  /** @type {URL} */
  let url;
  try {
    // `{CHECKOUT_SESSION_ID}` is a template the service fills in; braces are valid here.
    url = new URL(value);
  } catch {
    throw invalidRequest('Not a valid URL', key, 'url_invalid');
  }
  if (url.protocol !== 'http:' && url.protocol !== 'https:') {
    throw invalidRequest('Not a valid URL', key, 'url_invalid');
  }
  return value;
}

/**
 * @param {Params} params
 * @returns {string[]}
 */
export function expandParam(params) {
  const value = params.expand;
  if (value === undefined || value === '') return [];
  const list = Array.isArray(value) ? value : isRecord(value) ? Object.values(value) : [value];
  return list.map((item) => {
    if (typeof item !== 'string') throw invalidRequest('Invalid array', 'expand');
    return item;
  });
}

/**
 * A loose e-mail check: something@something.something, no spaces.
 * @param {string} value
 * @returns {boolean}
 */
export function looksLikeEmail(value) {
  return /^[^\s@]+@[^\s@]+\.[^\s@]+$/.test(value) && value.length <= 512;
}
