/// <reference lib="webworker" />
// The structure check runs here, off the page's thread, so a 1,000-atom file never freezes the screen.
import { answerStructureRequest, type StructureRequest } from '../features/structure/structureProtocol';

const scope = self as unknown as DedicatedWorkerGlobalScope;

scope.onmessage = (event: MessageEvent<StructureRequest>) => {
  scope.postMessage(answerStructureRequest(event.data));
};
