// The built `ask` (dist/, so run `npm run build` first) as a process: without a terminal
// (exit 2 and the message), and on a real pseudo-terminal made by util-linux `script`
// (Enter everywhere finishes; Ctrl-C exits 130 with the resume hint). Until main.ts
// registers `ask`, test/cli/ask/driver.mjs stands in for main (commander + registerAsk +
// main's UsageError handling); the bundled-CLI test runs once `ask` is in the bundle.
import { spawn, spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { parse } from 'yaml';
import { describe, expect, it } from 'vitest';
import { parseCaseText } from '../../../src/case/load.js';
import { ROOT, runCli, STACK } from '../../helpers/cli.js';

const DRIVER = fileURLToPath(new URL('./driver.mjs', import.meta.url));
const BUILT = join(ROOT, 'dist/cli/ask/index.js');
const fresh = () => mkdtempSync(join(tmpdir(), 'shaftwise-ask-cli-'));
const NO_TTY =
  /shaftwise: ask needs an interactive terminal, and standard input is not one\. To run without questions, write the duty in a case file \(see examples\/sawmill-infeed-roller\.yaml and the README\) and run: shaftwise advise CASE/;

describe('ask without a terminal', () => {
  it('exits 2 with a message pointing to case files and shaftwise advise, and writes nothing', () => {
    const cwd = fresh();
    const r = spawnSync(process.execPath, [DRIVER, 'ask'], { cwd, input: '', encoding: 'utf8' });
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(NO_TTY);
    expect(r.stderr).not.toMatch(STACK);
    expect(readdirSync(cwd)).toEqual([]);
  });

  const bundled = existsSync(join(ROOT, 'dist/bundle/shaftwise.mjs')) && runCli(['--help']).stdout.includes('ask');
  it.runIf(bundled)('through the bundled CLI (once main.ts registers ask): exit 2 and the same message', () => {
    const r = runCli(['ask']);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(NO_TTY);
  });
});

describe('start-up', () => {
  it('the built registerAsk module imports nothing statically (the prompt library loads in the action)', () => {
    const js = readFileSync(BUILT, 'utf8');
    expect(js).not.toMatch(/^\s*import\s[^(]/m);
    expect(js).toMatch(/await import\('\.\/run\.js'\)/);
  });
});

const hasScript = spawnSync('script', ['--version'], { encoding: 'utf8' }).status === 0;

/**
 * Run the driver on a pseudo-terminal. Keys are sent one step at a time whenever the
 * screen has been still for a moment (the next prompt is up); returns exit code and screen.
 */
function onTerminal(cwd: string, args: string[], keys: string[]): Promise<{ code: number | null; screen: string }> {
  return new Promise((resolve, reject) => {
    const cmd = [process.execPath, DRIVER, ...args].map((a) => `'${a}'`).join(' ');
    const child = spawn('script', ['-qfec', cmd, '/dev/null'], {
      cwd,
      env: { ...process.env, NO_COLOR: '1', COLUMNS: '200' },
    });
    let screen = '';
    let last = Date.now();
    let step = 0;
    child.stdout.on('data', (d: Buffer) => {
      screen += d.toString();
      last = Date.now();
    });
    const QUIET_MS = 150; // long enough for a prompt to draw on a loaded machine, short enough for ~25 prompts
    const timer = setInterval(() => {
      if (Date.now() - last < QUIET_MS || screen === '') return;
      if (step < keys.length) {
        child.stdin.write(keys[step++]!);
        last = Date.now();
      } else if (!child.stdin.writableEnded) {
        // Past the script: keep pressing Enter so an unexpected extra prompt cannot hang the test.
        child.stdin.write('\r');
        last = Date.now();
      }
    }, 25);
    child.on('error', reject);
    child.on('close', (code) => {
      clearInterval(timer);
      // eslint-disable-next-line no-control-regex -- ANSI escape codes start with ESC
      resolve({ code, screen: screen.replace(/\u001b\[[0-9;?]*[a-zA-Z]/g, '') });
    });
  });
}

describe.runIf(hasScript)('ask on a pseudo-terminal', () => {
  it('Enter at every question: exit 0, a case that validates, the advice printed', async () => {
    const cwd = fresh();
    const r = await onTerminal(cwd, ['ask'], Array<string>(40).fill('\r'));
    expect(r.code).toBe(0);
    const file = join(cwd, 'shaftwise-case.yaml');
    expect(() => parseCaseText(readFileSync(file, 'utf8'))).not.toThrow();
    expect(r.screen).toContain(`ADVICE-MARKER for ${file}`);
    expect(r.screen).toContain('Answers are saved to shaftwise-case.yaml as you go.');
  });

  it('Ctrl-C part-way: exit 130, the answers so far on file, and how to resume', async () => {
    const cwd = fresh();
    // Title typed, diameter in inches, Enter for the motion, then Ctrl-C at the speed.
    const r = await onTerminal(
      cwd,
      ['ask', '--save', 'irrigation-pump.yaml'],
      ['Irrigation pump jackshaft\r', '1.25 in\r', '\r', '\u0003'],
    );
    expect(r.code).toBe(130);
    expect(r.screen).toContain('Continue with: shaftwise ask --resume irrigation-pump.yaml');
    const doc = parse(readFileSync(join(cwd, 'irrigation-pump.yaml'), 'utf8'));
    expect(doc).toEqual({ title: 'Irrigation pump jackshaft', shaft: { diameter: '1.25 in' } });
    expect(readFileSync(join(cwd, 'irrigation-pump.yaml'), 'utf8')).toContain('"steer":{"motion":"rotating"}');
  });
});
