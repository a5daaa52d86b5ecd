/** Element and isotope data. */
export { elementBySymbol, elementByNumber, ELEMENT_COUNT, type ElementData } from './elements.js';
export { isotopeMass, atomMass } from './isotopes.js';
