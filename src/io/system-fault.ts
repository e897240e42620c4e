/**
 * A fault of the machine around the run, not of the case and not a bug: a folder that cannot be
 * written, a full disk, a closed output. The CLI prints its message as one line and exits 1.
 */
export class SystemFault extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'SystemFault';
  }
}

/** What to do about a file-system error `code` while writing `what` at `path`, in one line. */
export function systemFault(e: unknown, what: string, path: string): SystemFault | undefined {
  const code = (e as NodeJS.ErrnoException | undefined)?.code;
  const why: Record<string, string> = {
    EACCES: 'permission denied; make the folder writable or copy the case to a folder you can write',
    EPERM: 'permission denied; make the folder writable or copy the case to a folder you can write',
    EROFS: 'the file system is read-only; copy the case to a folder you can write',
    ENOSPC: 'the disk is full; free some space and run it again',
    EDQUOT: 'the disk quota is used up; free some space and run it again',
    ENOTDIR: 'a file stands where a folder must be; move that file away',
    EEXIST: 'a file stands where a folder must be; move that file away',
    EISDIR: 'a folder stands where a file must be; move that folder away',
    EIO: 'the disk reported an input/output error; check the disk',
    EMFILE: 'too many files are open; close some programs and run it again',
    ENAMETOOLONG: 'the path is too long; move the case to a shorter path',
  };
  if (code === undefined || !Object.hasOwn(why, code)) return undefined;
  return new SystemFault(`cannot write ${what} ${path}: ${why[code]} (${code}); nothing was written`);
}
