/** `npm run web:export`: rebuild the web export now, whether or not the sources changed. */
import { failAndExit } from './shell';
import { ensureWebExport } from './web-export';

ensureWebExport({ force: true }).then(() => process.exit(0), failAndExit);
