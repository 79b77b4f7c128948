/**
 * Starts Azurite's blob service (the Azure Storage emulator, installed as a dev dependency) on a
 * free loopback port with a throw-away folder, so @actions/artifact uploads to real blob storage.
 * The account and key are Azurite's published development ones ("devstoreaccount1").
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtemp, rm } from 'node:fs/promises';
import { createServer, connect } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { BlobServiceClient, StorageSharedKeyCredential } from '@azure/storage-blob';

export const AZURITE_ACCOUNT = 'devstoreaccount1';
export const AZURITE_KEY = 'Eby8vdM02xNOcqFlqUwJPLlmEtlCDXJ1OUzFT50uSRZ6IFsuFq2UVErCz4I6tq/K1SZFPTOtr/KBHBeksoGMGw==';

export interface Azurite {
  /** http://127.0.0.1:PORT/devstoreaccount1 */
  endpoint: string;
  credential: StorageSharedKeyCredential;
  service: BlobServiceClient;
  stop(): Promise<void>;
}

async function freePort(): Promise<number> {
  const server = createServer();
  await new Promise<void>((r) => server.listen(0, '127.0.0.1', r));
  const port = (server.address() as { port: number }).port;
  await new Promise<void>((r) => server.close(() => r()));
  return port;
}

async function accepts(port: number): Promise<boolean> {
  return new Promise((resolve) => {
    const socket = connect(port, '127.0.0.1');
    socket.once('connect', () => {
      socket.destroy();
      resolve(true);
    });
    socket.once('error', () => resolve(false));
  });
}

export async function startAzurite(root: string): Promise<Azurite> {
  const location = await mkdtemp(join(tmpdir(), 'bellgate-azurite-'));
  const port = await freePort();
  const bin = join(root, 'node_modules', '.bin', 'azurite-blob');
  const child: ChildProcess = spawn(
    bin,
    [
      '--blobHost',
      '127.0.0.1',
      '--blobPort',
      String(port),
      '--location',
      location,
      '--silent',
      '--skipApiVersionCheck',
      '--disableTelemetry',
    ],
    {
      stdio: 'ignore',
    },
  );
  let exited = false;
  child.once('exit', () => {
    exited = true;
  });
  // Bounded wait: at most 30 s for the port to open.
  for (let i = 0; i < 300 && !(await accepts(port)); i++) {
    if (exited) throw new Error('azurite-blob exited before it listened');
    await new Promise((r) => setTimeout(r, 100));
  }
  const endpoint = `http://127.0.0.1:${port}/${AZURITE_ACCOUNT}`;
  const credential = new StorageSharedKeyCredential(AZURITE_ACCOUNT, AZURITE_KEY);
  return {
    endpoint,
    credential,
    service: new BlobServiceClient(endpoint, credential),
    stop: async () => {
      if (!exited) {
        const gone = new Promise((r) => child.once('exit', r));
        child.kill('SIGTERM');
        await Promise.race([gone, new Promise((r) => setTimeout(r, 5000))]);
        if (!exited) child.kill('SIGKILL');
      }
      await rm(location, { recursive: true, force: true });
    },
  };
}
