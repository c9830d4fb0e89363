// `npm start`: the whole product on this machine, with the demo scenario loaded.
import path from 'node:path';
import { DEMO_PASSWORD, demoOrganisations } from '../apps/api/db/seeds/demo';
import { roleLabels, type Role } from '@kerfmark/contracts';
import { profile } from './lib/profile';
import { bringUp } from './lib/stack';
import { Supervisor } from './lib/supervisor';

const p = profile('dev');
const supervisor = new Supervisor(path.join(p.dataDir, 'logs'), { echo: process.argv.includes('--verbose') });
supervisor.handleSignals();

try {
  const env = await bringUp(p, supervisor, { fresh: false });
  const lines = demoOrganisations.flatMap((org) =>
    org.users.map((u) => `  ${roleLabels[u.role as Role].padEnd(12)} ${u.email.padEnd(28)} ${org.name}`),
  );
  console.log(`
Kerfmark is running.

  Open            ${env.APP_URL}
  Mail catcher    ${env.MAIL_CATCHER_URL}   (every e-mail Kerfmark sends lands here)
  Logs            ${path.join(p.dataDir, 'logs')}

Demo sign-ins (password for all: ${DEMO_PASSWORD})
${lines.join('\n')}

Press Ctrl-C to stop everything.`);
} catch (error) {
  console.error(`\nCould not start Kerfmark: ${(error as Error).message}`);
  await supervisor.stopAll(1);
}
