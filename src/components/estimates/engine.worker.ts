/// <reference lib="webworker" />
// The estimate page's engine worker: one message in (EngineRequest), one answer out (EngineAnswer).
import { answerEngineRequest, type EngineRequest } from './engine-request';

const scope = self as unknown as DedicatedWorkerGlobalScope;

scope.onmessage = (event: MessageEvent<EngineRequest>) => {
  scope.postMessage(answerEngineRequest(event.data));
};
