import { ensureDependencies } from './lib/deps.mjs';
import { ensureWebBuild } from './lib/web.mjs';

ensureDependencies();
ensureWebBuild();
