import { readFileSync } from 'node:fs';

interface ProfileNode {
  id: number;
  callFrame: { functionName: string; url: string; lineNumber: number };
  children?: number[];
}

interface CpuProfile {
  nodes: ProfileNode[];
  samples: number[];
  timeDeltas: number[];
  startTime: number;
  endTime: number;
}

/** Which package (or our own folder) a frame's file belongs to. */
function bucketOf(url: string, name: string): string {
  if (!url) return name.startsWith('(') ? name : '(native)';
  const pkg = /node_modules\/((?:@[^/]+\/)?[^/]+)/.exec(url);
  if (pkg) return pkg[1]!;
  if (url.startsWith('node:')) return url;
  const own = /\/(server|shared|test)\/(?:features\/)?([^/]+)/.exec(url);
  return own ? `${own[1]}/${own[2]}` : url;
}

/**
 * Self time of a .cpuprofile (node --cpu-prof) by package and by function, as text: where the
 * process's own CPU went, with idle shown apart so busy time can be read as a share of itself.
 */
export function summariseProfile(path: string, top = 30): string {
  const profile = JSON.parse(readFileSync(path, 'utf8')) as CpuProfile;
  const byId = new Map(profile.nodes.map((node) => [node.id, node]));
  const selfUs = new Map<number, number>();
  profile.samples.forEach((id, index) => selfUs.set(id, (selfUs.get(id) ?? 0) + (profile.timeDeltas[index] ?? 0)));
  const buckets = new Map<string, number>();
  const functions = new Map<string, number>();
  let busy = 0;
  let idle = 0;
  for (const [id, us] of selfUs) {
    const frame = byId.get(id)!.callFrame;
    if (frame.functionName === '(idle)') {
      idle += us;
      continue;
    }
    busy += us;
    const bucket = bucketOf(frame.url, frame.functionName);
    buckets.set(bucket, (buckets.get(bucket) ?? 0) + us);
    const fn = `${frame.functionName || '(anonymous)'} ${frame.url.replace(/^.*node_modules\//, '').replace(/^file:\/\/.*?\/(server|shared)\//, '$1/')}:${frame.lineNumber + 1}`;
    functions.set(fn, (functions.get(fn) ?? 0) + us);
  }
  const lines = [`busy ${(busy / 1e6).toFixed(1)} s, idle ${(idle / 1e6).toFixed(1)} s`, '', 'self time by package:'];
  const share = (us: number) => `${((100 * us) / busy).toFixed(1).padStart(5)}%  ${(us / 1000).toFixed(0).padStart(6)} ms`;
  for (const [bucket, us] of [...buckets].sort((a, b) => b[1] - a[1]).slice(0, top)) lines.push(`  ${share(us)}  ${bucket}`);
  lines.push('', 'self time by function:');
  for (const [fn, us] of [...functions].sort((a, b) => b[1] - a[1]).slice(0, top)) lines.push(`  ${share(us)}  ${fn}`);
  return lines.join('\n');
}

if (process.argv[1]?.endsWith('profile-summary.ts') && process.argv[2]) console.log(summariseProfile(process.argv[2]));
