import fsp from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { localFileStorage } from './file-storage';

const dirs: string[] = [];
async function tempRoot() {
  const dir = await fsp.mkdtemp(path.join(os.tmpdir(), 'understudy-storage-'));
  dirs.push(dir);
  return dir;
}
afterEach(async () => {
  await Promise.all(dirs.splice(0).map((d) => fsp.rm(d, { recursive: true, force: true })));
});

describe('localFileStorage', () => {
  it('stores, reads, streams and removes bytes under a key', async () => {
    const root = await tempRoot();
    const storage = localFileStorage(root);
    await storage.put('ab/abcdef.pdf', Buffer.from('%PDF-1.7 hello'));
    expect(await storage.exists('ab/abcdef.pdf')).toBe(true);
    expect((await storage.read('ab/abcdef.pdf')).toString()).toBe('%PDF-1.7 hello');
    const chunks: Buffer[] = [];
    for await (const chunk of storage.stream('ab/abcdef.pdf')) chunks.push(chunk as Buffer);
    expect(Buffer.concat(chunks).toString()).toBe('%PDF-1.7 hello');
    await storage.remove('ab/abcdef.pdf');
    expect(await storage.exists('ab/abcdef.pdf')).toBe(false);
    await storage.remove('ab/abcdef.pdf');
  });

  it('leaves no temporary file behind', async () => {
    const root = await tempRoot();
    await localFileStorage(root).put('x/y.pdf', Buffer.from('data'));
    expect(await fsp.readdir(path.join(root, 'x'))).toEqual(['y.pdf']);
  });

  it('refuses keys that could leave its folder', async () => {
    const storage = localFileStorage(await tempRoot());
    await expect(storage.put('../escape.pdf', Buffer.from('x'))).rejects.toThrow(/Unsafe/);
    await expect(storage.put('/etc/passwd', Buffer.from('x'))).rejects.toThrow(/Unsafe/);
  });
});
