/**
 * Largest JSON request body the API parses. A sync push of up to 200 changes may carry scan results
 * and processing parameters, so Express's 100 kB default is too small; files go through the upload
 * routes, never through JSON.
 */
export const JSON_BODY_LIMIT_BYTES = 4 * 1024 * 1024;
