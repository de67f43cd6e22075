/** The Firnline version, from package.json, for exports made in the browser. */
import { version } from '../package.json';

export const FIRNLINE_VERSION: string = version;
