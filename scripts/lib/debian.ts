import { spawnSync } from 'node:child_process';

export function hasCommand(name: string): boolean {
  return spawnSync('sh', ['-c', `command -v ${name}`], { stdio: 'ignore' }).status === 0;
}

/**
 * Installs a Debian package when the binary it provides is missing. Runs apt-get as
 * root, non-interactively; prints what it does because it takes half a minute.
 */
export function ensureDebianPackage(binary: string, pkg: string, lookIn: string[] = []) {
  if (hasCommand(binary) || lookIn.some((p) => spawnSync('test', ['-x', p]).status === 0)) return;
  if (process.getuid && process.getuid() !== 0) {
    throw new Error(`${binary} is missing: install Debian's ${pkg} (sudo apt-get install -y ${pkg}) and run again`);
  }
  console.log(`gelwright: installing Debian's ${pkg} (apt-get, about 30 s) …`);
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  let result = spawnSync('apt-get', ['install', '-y', '-q', '--no-install-recommends', pkg], { stdio: 'inherit', env });
  if (result.status !== 0) {
    spawnSync('apt-get', ['update', '-q'], { stdio: 'inherit', env });
    result = spawnSync('apt-get', ['install', '-y', '-q', '--no-install-recommends', pkg], { stdio: 'inherit', env });
  }
  if (result.status !== 0) throw new Error(`apt-get could not install ${pkg}; see the messages above`);
}
