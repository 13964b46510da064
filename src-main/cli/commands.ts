// Sub-commands beyond `calc` register themselves here (one line each). Each loads its module when it runs, so a
// calc never loads the site schema, the assessment or the report libraries.
import { registerCommand } from './main';

registerCommand('assess', async (args, json) => (await import('./assess-command')).assessCommand(args, json));
