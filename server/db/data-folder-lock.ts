import { mkdirSync } from 'node:fs';
import { readFile, rm, writeFile } from 'node:fs/promises';
import path from 'node:path';
import lockfile from 'proper-lockfile';

// PGlite does not lock its folder, and two processes on one folder have lost a committed write,
// so the server holds this lock for as long as it has the database open.

const LOCK_NAME = 'pinwork.lock';
const OWNER_NAME = 'pinwork.pid';
// Generous, because a first start without a snapshot blocks the event loop (and so the lock's
// mtime refresh) for many seconds while PGlite builds its files.
const STALE_MS = 60_000;
const UPDATE_MS = 10_000;

export class DataFolderInUseError extends Error {
  constructor(
    readonly folder: string,
    readonly ownerPid: number | null,
  ) {
    super(
      `Pinwork is already running on data folder ${folder} (pid ${ownerPid ?? 'unknown'}); ` +
        'stop it or set DATA_DIR to another folder',
    );
    this.name = 'DataFolderInUseError';
  }
}

export interface DataFolderLock {
  folder: string;
  release(): Promise<void>;
}

export interface LockOptions {
  /** Called if the lock is lost while held (its folder removed, or taken over as stale). */
  onCompromised(error: Error): void;
}

export async function lockDataFolder(dataDir: string, options: LockOptions): Promise<DataFolderLock> {
  const folder = path.resolve(dataDir);
  mkdirSync(folder, { recursive: true });
  const lockOptions = {
    lockfilePath: path.join(folder, LOCK_NAME),
    realpath: false,
    stale: STALE_MS,
    update: UPDATE_MS,
    retries: 0,
    onCompromised: options.onCompromised,
  };

  let releaseLock: () => Promise<void>;
  try {
    releaseLock = await lockfile.lock(folder, lockOptions);
  } catch (error) {
    if (!isLockHeld(error)) throw error;
    const ownerPid = await readOwnerPid(folder);
    // The owner died without unlocking (kill -9, power loss) well before the stale time ran out:
    // the lock is only its leftover, so clear it rather than make the user wait a minute.
    if (ownerPid !== null && !isProcessAlive(ownerPid)) {
      await rm(lockOptions.lockfilePath, { recursive: true, force: true });
      try {
        releaseLock = await lockfile.lock(folder, lockOptions);
      } catch (retryError) {
        if (isLockHeld(retryError)) throw new DataFolderInUseError(folder, await readOwnerPid(folder));
        throw retryError;
      }
    } else {
      throw new DataFolderInUseError(folder, ownerPid);
    }
  }

  await writeFile(path.join(folder, OWNER_NAME), `${process.pid}\n`);
  let released = false;
  return {
    folder,
    async release() {
      if (released) return;
      released = true;
      await rm(path.join(folder, OWNER_NAME), { force: true });
      await releaseLock();
    },
  };
}

function isLockHeld(error: unknown): boolean {
  return (error as NodeJS.ErrnoException | undefined)?.code === 'ELOCKED';
}

async function readOwnerPid(folder: string): Promise<number | null> {
  try {
    const pid = Number.parseInt(await readFile(path.join(folder, OWNER_NAME), 'utf8'), 10);
    return Number.isSafeInteger(pid) && pid > 0 ? pid : null;
  } catch {
    return null;
  }
}

function isProcessAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (error) {
    // EPERM: it exists but belongs to someone else.
    return (error as NodeJS.ErrnoException).code === 'EPERM';
  }
}
