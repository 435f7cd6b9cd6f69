// The worker entry: a comlink wrapper over the core, nothing more.
import * as Comlink from 'comlink';
import { createViewFactorApi } from './api';

Comlink.expose(createViewFactorApi());
