export interface Io {
  stdout: (s: string) => void;
  stderr: (s: string) => void;
  cwd: string;
}

export const processIo: Io = {
  stdout: (s) => process.stdout.write(s),
  stderr: (s) => process.stderr.write(s),
  cwd: process.cwd(),
};
