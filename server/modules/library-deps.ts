// What the library's services share: the database, config, outbox and every repository.
import type { Knex } from 'knex';
import type { Config } from '../config.ts';
import { createAuditRepository } from './audit/audit.repository.ts';
import { createAuthRepository } from './auth/auth.repository.ts';
import { createFollowsRepository } from './follows/follows.repository.ts';
import { createInvitesRepository } from './invites/invites.repository.ts';
import { createMembersRepository } from './members/members.repository.ts';
import type { Outbox } from './mail/outbox.ts';
import { createPatternsRepository } from './patterns/patterns.repository.ts';
import { createRevisionsRepository } from './revisions/revisions.repository.ts';
import { createShareRepository } from './share/share.repository.ts';

export function createRepositories(db: Knex) {
  return {
    auth: createAuthRepository(db),
    audit: createAuditRepository(db),
    follows: createFollowsRepository(db),
    invites: createInvitesRepository(db),
    members: createMembersRepository(db),
    patterns: createPatternsRepository(db),
    revisions: createRevisionsRepository(db),
    shares: createShareRepository(db),
  };
}
export type Repositories = ReturnType<typeof createRepositories>;

export interface LibraryDeps {
  db: Knex;
  config: Config;
  outbox: Outbox;
  repos: Repositories;
}
