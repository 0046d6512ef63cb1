/**
 * scan: inputs (CSV kind rule and its option), nothing lost (a failed run leaves the output
 * directory as it was), and the command-line habits (usage errors exit 2, help texts,
 * errors that name the option or the directory and the cause).
 */
import { existsSync, mkdirSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import { MAIN, runCli, tempDir } from './cliHarness.js';

// Synthetic CSV rows (invented elements). 2031 AA1: a = 2.5 au, e = 0.1, i = 5° has T_J > 3
// (an ordinary main-belt orbit; Tisserand parameter, common practice), so read as a comet it
// is an asteroid-like-T candidate and read as an asteroid it is none.
const CSV = [
  'designation,epoch,a,e,i,om,w,ma,H',
  '2031 AA1,2463000.5,2.5,0.1,5,10,20,30,15',
  '2031 AA2,2463000.5,2.6,0.12,6,10,20,30,15',
].join('\n') + '\n';

/** Whether this process may make a private mount namespace and mount in it (see the test). */
function canMountReadOnly(): boolean {
  if (process.platform !== 'linux') return false;
  const probe = tempDir();
  const r = spawnSync('unshare', ['-m', 'sh', '-c', `mount -t tmpfs tmpfs '${probe}' && umount '${probe}'`], { encoding: 'utf8' });
  return r.status === 0;
}

function summaryOf(out: string) {
  return JSON.parse(readFileSync(join(out, 'summary.json'), 'utf8'));
}

function candidatesOf(out: string): { designation: string; class: string }[] {
  return readFileSync(join(out, 'candidates.jsonl'), 'utf8').trim().split('\n').filter(Boolean).map((l) => JSON.parse(l));
}

/** Every file of a directory with its bytes, to compare a directory before and after. */
function snapshot(dir: string): Record<string, string> {
  return Object.fromEntries(readdirSync(dir, { withFileTypes: true }).map((e) =>
    [e.name, e.isDirectory() ? '<directory>' : readFileSync(join(dir, e.name), 'latin1')]).sort());
}

describe('scan: CSV rows classed as asteroids or comets', () => {
  it('by designation pattern unless --csv-kind forces one kind; the summary says which rule and how many', () => {
    const dir = tempDir();
    writeFileSync(join(dir, 'x.csv'), CSV);
    const auto = join(dir, 'auto');
    expect(runCli(['scan', join(dir, 'x.csv'), '--out', auto, '--quiet']).status).toBe(0);
    expect(summaryOf(auto).files[0].bodyKind).toEqual({ rule: 'designation-pattern', asteroid: 2, comet: 0 });
    expect(summaryOf(auto).options.csvKind).toBe('auto');
    expect(candidatesOf(auto).filter((c) => c.designation === '2031 AA1')).toEqual([]);

    const comet = join(dir, 'comet');
    expect(runCli(['scan', join(dir, 'x.csv'), '--out', comet, '--quiet', '--csv-kind', 'comet']).status).toBe(0);
    expect(summaryOf(comet).files[0].bodyKind).toEqual({ rule: 'forced', asteroid: 0, comet: 2 });
    expect(summaryOf(comet).options.csvKind).toBe('comet');
    expect(candidatesOf(comet).find((c) => c.designation === '2031 AA1')?.class).toBe('asteroid-like-T');
  });

  it('an unknown --csv-kind is a usage error naming the option and its values', () => {
    const r = runCli(['scan', '--csv-kind', 'rock']);
    expect(r.status).toBe(2);
    expect(r.stderr).toContain('--csv-kind');
    expect(r.stderr).toContain('auto, asteroid, comet');
  });
});

describe('scan: rejected rows in report.md', () => {
  // A real line of the one-line orbit export format (line 1 of
  // /work/shared/data/orbits-export-sample.txt; provenance in test/fixtures/orbit-export/).
  const CERES = '00001    3.34  0.15 K2669 274.41935   73.29420   80.24863   10.58803  0.0796923  0.21430445   2.7655526  0 MPO980521  7297 126 1801-2026 0.83 M-v 30k Veres      4000      (1) Ceres              20260103';

  it('groups by reason with the quoted text as a placeholder, shows the first row as written, says "duplicate designation" once', () => {
    const dir = tempDir();
    const lines = [
      CERES,
      CERES.replace(' K2669 ', ' K26Z9 '), // month Z: no such packed month
      CERES.replace(' K2669 ', ' K26Y9 '),
      CERES.replace(' K2669 ', ' K2668 '), // older epoch: a superseded duplicate
    ];
    writeFileSync(join(dir, 'o.txt'), lines.join('\n') + '\n');
    const out = join(dir, 'out');
    expect(runCli(['scan', join(dir, 'o.txt'), '--out', out, '--quiet']).status).toBe(0);
    const report = readFileSync(join(out, 'report.md'), 'utf8');
    expect(report).toContain(`| parse: packed date has a month outside 1..9, A..C: '…' | 2 | ${join(dir, 'o.txt')}:2: packed date has a month outside 1..9, A..C: 'K26Z9' |`);
    expect(report).toContain('| duplicate designation: epoch not newer than FILE:LINE, which is kept | 1 |');
    expect(report).not.toContain('duplicate: duplicate');
    expect(summaryOf(out).rejects.examples["parse: packed date has a month outside 1..9, A..C: '…'"])
      .toBe(`${join(dir, 'o.txt')}:2: packed date has a month outside 1..9, A..C: 'K26Z9'`);
  });
});

describe('scan: nothing lost', () => {
  it('no input could be read: exit 1, and an existing output directory is left byte for byte', () => {
    const dir = tempDir();
    writeFileSync(join(dir, 'good.csv'), CSV);
    const out = join(dir, 'out');
    expect(runCli(['scan', join(dir, 'good.csv'), '--out', out, '--quiet']).status).toBe(0);
    writeFileSync(join(out, 'notes.txt'), 'my own notes\n');
    const before = snapshot(out);
    const r = runCli(['scan', join(dir, 'nofile.txt'), '--out', out, '--quiet']);
    expect(r.status).toBe(1);
    const lines = r.stderr.trim().split('\n');
    expect(lines[0]).toMatch(/nofile\.txt: /);
    expect(lines[lines.length - 1]).toBe(`wayward: no input could be read; nothing written, ${out} left as it was`);
    expect(snapshot(out)).toEqual(before);
  });

  it('no input could be read: an output directory that did not exist is not created', () => {
    const dir = tempDir();
    const r = runCli(['scan', join(dir, 'nofile.txt'), '--out', join(dir, 'a', 'out'), '--quiet']);
    expect(r.status).toBe(1);
    expect(readdirSync(dir)).toEqual([]);
  });

  it('a run that fails while putting its outputs in place leaves no mix of old and new files', () => {
    const dir = tempDir();
    writeFileSync(join(dir, 'good.csv'), CSV);
    const out = join(dir, 'out');
    expect(runCli(['scan', join(dir, 'good.csv'), '--out', out, '--quiet']).status).toBe(0);
    // report.md replaced by a directory: the run cannot put its report in place
    rmSync(join(out, 'report.md'));
    mkdirSync(join(out, 'report.md'));
    const before = snapshot(out);
    const r = runCli(['scan', join(dir, 'good.csv'), '--out', out, '--quiet', '--csv-kind', 'comet']);
    expect(r.status).toBe(1);
    expect(r.stderr).toContain(`cannot write output directory ${out}: report.md is a directory (EISDIR)`);
    expect(snapshot(out)).toEqual(before); // candidates.* still those of the first run
    expect(readdirSync(out).some((f) => f.startsWith('.'))).toBe(false); // no staging left
  });

  it('an output directory under a regular file: exit 1, one line naming the directory and the real cause', () => {
    const dir = tempDir();
    writeFileSync(join(dir, 'good.csv'), CSV);
    writeFileSync(join(dir, 'plain'), '');
    const out = join(dir, 'plain', 'out');
    const r = runCli(['scan', join(dir, 'good.csv'), '--out', out, '--quiet']);
    expect(r.status).toBe(1);
    expect(r.stderr).toBe(`wayward: cannot write output directory ${out}: ${join(dir, 'plain')} is not a directory (ENOTDIR)\n`);
  });

  // A read-only file system needs a mount of its own: a private mount namespace (Linux
  // unshare(1), needs the privilege to mount) with a read-only tmpfs. Skipped where that is
  // not allowed; chmod alone does not stop root.
  it.skipIf(!canMountReadOnly())('an output directory on a read-only file system: the message says EROFS, old files stay', () => {
    const dir = tempDir();
    writeFileSync(join(dir, 'good.csv'), CSV);
    const ro = join(dir, 'ro');
    mkdirSync(ro);
    const script = [
      `mount -t tmpfs tmpfs '${ro}'`, `mkdir '${ro}/out'`, `echo old > '${ro}/out/summary.json'`,
      `mount -o remount,ro '${ro}'`,
      `'${process.execPath}' '${MAIN}' scan '${join(dir, 'good.csv')}' --out '${ro}/out' --quiet; echo "rc=$?"`,
      `'${process.execPath}' '${MAIN}' scan '${join(dir, 'good.csv')}' --out '${ro}/new' --quiet; echo "rc=$?"`,
      `cat '${ro}/out/summary.json'`,
    ].join(' && ');
    const r = spawnSync('unshare', ['-m', 'sh', '-c', script], { encoding: 'utf8' });
    expect(r.stdout).toBe('rc=1\nrc=1\nold\n');
    expect(r.stderr).toBe(
      `wayward: cannot write output directory ${ro}/out: read-only file system (EROFS)\n` +
      `wayward: cannot write output directory ${ro}/new: read-only file system (EROFS)\n`);
  });

  it('no file names: stdout says in one line that the bundled demo catalogue was scanned, and so does summary.json', () => {
    const dir = tempDir();
    const out = join(dir, 'demo');
    const r = runCli(['scan', '--out', out]);
    expect(r.status).toBe(0);
    expect(r.stdout.split('\n')[0]).toMatch(/^No files named: scanned the bundled demo catalogue \(invented data\): .*orbits\.txt, .*comets\.txt\.$/);
    expect(summaryOf(out).demoCatalogue).toBe(true);
    expect(readFileSync(join(out, 'report.md'), 'utf8')).toContain('No files were named: this is the bundled demo catalogue (invented data).');

    writeFileSync(join(dir, 'x.csv'), CSV);
    const own = join(dir, 'own');
    const r2 = runCli(['scan', join(dir, 'x.csv'), '--out', own]);
    expect(r2.stdout).not.toContain('demo catalogue');
    expect(summaryOf(own).demoCatalogue).toBe(false);
    expect(readFileSync(join(own, 'report.md'), 'utf8')).not.toContain('demo catalogue');
  });
});

describe('scan: command-line habits', () => {
  it('--columns with an unknown orbit field is a usage error (exit 2) naming the option', () => {
    const dir = tempDir();
    writeFileSync(join(dir, 'x.csv'), CSV);
    const r = runCli(['scan', join(dir, 'x.csv'), '--columns', 'foo=bar', '--out', join(dir, 'o')]);
    expect(r.status).toBe(2);
    expect(r.stderr).toContain("--columns");
    expect(r.stderr).toContain("unknown orbit field 'foo'");
    expect(existsSync(join(dir, 'o'))).toBe(false);
    expect(runCli(['scan', '--columns', 'designation']).status).toBe(2);
    expect(runCli(['scan', '--columns', 'e=a,e=b']).status).toBe(2);
  });

  it('no command shows a default as JSON or a boolean flag with (default: false) in its help', () => {
    for (const command of ['scan', 'propagate']) {
      const help = runCli([command, '--help']).stdout.replace(/\s+/g, ' ');
      expect(help, command).toContain('Options:');
      expect(help, command).not.toMatch(/\(default: [["{]/);
      expect(help, command).not.toMatch(/\(default: (false|true)\)/);
      expect(help.match(/\(default:/g)?.length ?? 0, command).toBe(help.match(/\(default: [^)]*\)/g)?.length ?? 0);
      expect(help, command).not.toMatch(/\(default: [^)]*\) \(default:/);
    }
  });

  it('help shows defaults as written, never as JSON, and lists the values of --input-format and --csv-kind', () => {
    const help = runCli(['scan', '--help']).stdout.replace(/\s+/g, ' ');
    expect(help).not.toMatch(/\(default: \[/);
    expect(help).not.toMatch(/\(default: "/);
    expect(help).not.toContain('(default: false)');
    expect(help).toContain('(default: wayward-out)');
    expect(help).toMatch(/--input-format <format> force the input format, one of: orbit-export, comet-export, csv/);
    expect(help).toMatch(/--csv-kind <kind> .*auto .*asteroid or comet/);
  });

  it('a file of no known format: the message names the option that sets the format', () => {
    const dir = tempDir();
    writeFileSync(join(dir, 'notes.txt'), 'hello world\nnothing here\n');
    const r = runCli(['scan', join(dir, 'notes.txt'), '--out', join(dir, 'o'), '--quiet']);
    expect(r.status).toBe(1);
    expect(r.stderr.split('\n')[0]).toContain('(option --input-format: orbit-export, comet-export, csv)');
  });
});
