/** Largest structure the parsers accept: keeps detection interactive on a tablet. */
export const MAX_ATOMS = 1000;

/** Two atoms closer than this (Å) are taken as a duplicated line, not a real pair. */
export const DUPLICATE_DISTANCE = 0.01;
