export interface BannerAccount {
  email: string;
  password: string;
  role: string;
  name: string;
}

export interface BannerInput {
  url: string;
  accounts: BannerAccount[];
  mailDir: string;
  dataDir: string;
  dbPort: number;
  smtpPort: number;
  /** False when the outbox screen is off (production mode). */
  outbox: boolean;
}

/**
 * What `npm start` prints once everything is up. The smoke test reads the ready line and the
 * account lines, so their shape is a contract: `Soundframe is ready at <url>` and
 * `  <role>  <email>  /  <password>`.
 */
export function formatBanner(input: BannerInput): string {
  const roleWidth = Math.max(10, ...input.accounts.map((a) => a.role.length)) + 1;
  const emailWidth = Math.max(0, ...input.accounts.map((a) => a.email.length));
  const rule = '─'.repeat(64);
  const lines = [
    '',
    rule,
    `Soundframe is ready at ${input.url}`,
    '',
    'Demo sign-ins (email  /  password):',
    ...input.accounts.map(
      (a) => `  ${a.role.padEnd(roleWidth)} ${a.email.padEnd(emailWidth)}  /  ${a.password}`,
    ),
    '',
    `Mail goes to a local sink on 127.0.0.1:${input.smtpPort}, never out: kept in ${input.mailDir}` +
      (input.outbox ? `,\nreadable at ${input.url}/outbox` : ''),
    `Data (MariaDB on 127.0.0.1:${input.dbPort}, photos, secrets): ${input.dataDir}`,
    'Stop with Ctrl-C: the server closes and MariaDB shuts down cleanly.',
    rule,
    '',
  ];
  return lines.join('\n');
}
