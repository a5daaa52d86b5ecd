/** Loading the compound library bundled into the build (see scripts/build-library.mjs). */
import { LIBRARY_JSON } from './data.generated.js';
import { validateLibrary, type Library } from './validate-library.js';

let cached: Library | undefined;

/** The bundled compound library, validated once and cached. */
export function loadLibrary(): Library {
  cached ??= validateLibrary(JSON.parse(LIBRARY_JSON));
  return cached;
}
