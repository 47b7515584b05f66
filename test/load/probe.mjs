/**
 * Preloaded into an app process by test/load/profile.ts (NODE_OPTIONS=--import; node refuses --cpu-prof
 * there, so the profile is taken through node:inspector instead):
 * - counts every SQL statement the process sends through pg, with the time from send to answer, keyed by
 *   the statement's text; on SIGUSR2 it writes the counts so far to SQL_COUNT_FILE, so a profiler can take
 *   a reading before and after a run of one request type and divide by the requests sent;
 * - records a CPU profile from start to exit into CPU_PROFILE_FILE.
 */
import inspector from 'node:inspector';
import { createRequire } from 'node:module';
import { writeFileSync } from 'node:fs';

if (process.env.CPU_PROFILE_FILE) {
  const session = new inspector.Session();
  session.connect();
  session.post('Profiler.enable');
  session.post('Profiler.setSamplingInterval', { interval: 500 });
  session.post('Profiler.start');
  // The inspector answers on this thread at once, so the profile is written before the process ends.
  process.on('exit', () => {
    session.post('Profiler.stop', (error, result) => {
      if (!error) writeFileSync(process.env.CPU_PROFILE_FILE, JSON.stringify(result.profile));
    });
  });
}

const require = createRequire(`${process.cwd()}/package.json`);
const { Client } = require('pg');
const counts = new Map();
const original = Client.prototype.query;

const keyOf = (config) => {
  const text = typeof config === 'string' ? config : (config?.text ?? '');
  return text.replace(/\s+/g, ' ').trim().slice(0, 110);
};

Client.prototype.query = function countedQuery(config, values, callback) {
  const key = keyOf(config);
  const started = performance.now();
  const entry = counts.get(key) ?? { count: 0, ms: 0 };
  counts.set(key, entry);
  entry.count += 1;
  const result = original.call(this, config, values, callback);
  if (result && typeof result.then === 'function') {
    result.then(
      () => (entry.ms += performance.now() - started),
      () => (entry.ms += performance.now() - started),
    );
  }
  return result;
};

process.on('SIGUSR2', () => {
  writeFileSync(process.env.SQL_COUNT_FILE ?? '/tmp/sql-counts.json', JSON.stringify(Object.fromEntries(counts)));
});
