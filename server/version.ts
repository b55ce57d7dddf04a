import pkg from '../package.json' with { type: 'json' };

export const APP_VERSION: string = pkg.version;
export const PHYSICS_VERSION_LABEL = `gelwright ${APP_VERSION}`;
