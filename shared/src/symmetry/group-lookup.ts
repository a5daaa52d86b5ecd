/** Finding an operation matrix in a built group: its index, its class, its characters. */
import type { Mat3 } from './types.js';
import type { PointGroup } from './group-types.js';
import { matKey } from './mat3.js';

const indexCache = new WeakMap<PointGroup, Map<string, number>>();

/** Index of op in group.operations, or undefined when op is not an operation of the group. */
export function operationIndex(group: PointGroup, op: Mat3): number | undefined {
  let index = indexCache.get(group);
  if (!index) {
    index = new Map(group.operations.map((o, i) => [matKey(o.matrix), i]));
    indexCache.set(group, index);
  }
  return index.get(matKey(op));
}

/** Class index of op in group; throws when op does not belong to the group. */
export function classIndexOf(group: PointGroup, op: Mat3): number {
  const i = operationIndex(group, op);
  if (i === undefined) throw new RangeError(`matrix is not an operation of ${group.name}`);
  return group.operations[i].classIndex;
}
