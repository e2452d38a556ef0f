// Every table, for drizzle-kit, the database module and better-auth's adapter.
export * from './auth';
export * from './customers';
export * from './tickets';
export * from './presets';
export * from './files';
export * from './audit';
export * from './prices';
export * from './payments';
export * from './notices';
export * from './limits';
export * from './sent-mail';
export * from './list-versions';
export * from './kind-fittings';
