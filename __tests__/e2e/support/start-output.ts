/** Reads what `npm start` prints (see server/tools/banner.ts): the ready line and the demo sign-ins. */
export const READY_LINE = /^Soundframe is ready at (http:\/\/127\.0\.0\.1:(\d+))\s*$/m;
const ACCOUNT_LINE = /^ {2}([a-z]+) +(\S+@\S+) +\/ {2}(\S(?:.*\S)?)\s*$/gm;

export interface PrintedAccount {
  role: string;
  email: string;
  password: string;
}

export function parseReadyUrl(output: string): { url: string; port: number } | null {
  const match = READY_LINE.exec(output);
  return match ? { url: match[1], port: Number(match[2]) } : null;
}

export function parseAccounts(output: string): PrintedAccount[] {
  return [...output.matchAll(ACCOUNT_LINE)].map(([, role, email, password]) => ({
    role,
    email,
    password,
  }));
}
