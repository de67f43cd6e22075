/**
 * Checks an experiment off the main thread: validating thousands of members takes seconds, and
 * the page must stay responsive meanwhile. Answers once with the validator's result.
 */
import { checkNow, type CheckRequest } from './experimentCheck';


onmessage = (event: MessageEvent<CheckRequest>) => postMessage(checkNow(event.data));
