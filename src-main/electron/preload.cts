// The sandboxed preload (bundled to CommonJS by build.js): window.gprime, one function per channel.
import { exposeGprime } from './preload-api';

exposeGprime();
