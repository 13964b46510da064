// Sub-commands beyond `calc` register themselves here (one line each).
import { registerCommand } from './main';
import { assessCommand } from './assess-command';

registerCommand('assess', assessCommand);
