import type { ReadText } from '../../src/scenario/resolve-scenario.js';

/**
 * A readText over files held in memory: a string is the file's text as is,
 * anything else is written out as JSON. A name not held throws `no such file`,
 * as the shell's reader does.
 */
export function memoryFiles(files: Readonly<Record<string, unknown>>): ReadText {
  return (path) => {
    if (!Object.hasOwn(files, path)) throw new Error('no such file');
    const content = files[path];
    return typeof content === 'string' ? content : JSON.stringify(content, null, 2);
  };
}
