// The shared package compiles against the ES library only (no DOM, no Node types), yet
// TextDecoder exists in every browser and in Node; declare just the part the importer uses.
declare class TextDecoder {
  constructor(label?: string, options?: { fatal?: boolean; ignoreBOM?: boolean });
  decode(input?: ArrayBuffer | ArrayBufferView): string;
}
