// Child process for atomicWrite.test.ts: starts an atomic save whose write
// stalls forever after half the bytes, so the parent can kill it mid-write.
import { atomicWriteFile, nodeAtomicWriteOps, type AtomicWriteOps } from '../../../electron/atomicWrite';

const target = process.argv[2];
if (target === undefined) throw new Error('usage: slowAtomicWriter.ts <target>');

const stalling: AtomicWriteOps = {
  ...nodeAtomicWriteOps,
  open: async (path, flags, mode) => {
    const real = await nodeAtomicWriteOps.open(path, flags, mode);
    return {
      writeFile: async (data) => {
        const text = typeof data === 'string' ? data : new TextDecoder().decode(data);
        await real.writeFile(text.slice(0, text.length / 2));
        await real.sync();
        process.stdout.write('writing\n');
        await new Promise(() => undefined);
      },
      sync: () => real.sync(),
      close: () => real.close(),
    };
  },
};

setInterval(() => undefined, 1000);
await atomicWriteFile(target, 'y'.repeat(100_000), stalling);
