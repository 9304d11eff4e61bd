import { execFile } from 'node:child_process';
import { promisify } from 'node:util';
import { describe, expect, it } from 'vitest';
import { expectClose } from '../support/assertInDelta';
import { repoRoot, run } from './support/cliRun';



async function json(...argv: string[]): Promise<Record<string, number>> {
  const r = await run(...argv, '--json');
  expect(r.err).toBe('');
  expect(r.code).toBe(0);
  return JSON.parse(r.out) as Record<string, number>;
}

describe('blockwise air --json', () => {
  it('gives the 1976 standard at 11,000 m geopotential', async () => {
    // U.S. Standard Atmosphere 1976, Table 4 (from memory): 216.65 K, 22,632.06 Pa at H = 11 km.
    const j = await json('air', '--altitude', '11000 m');
    expectClose(j.pressureAltitude_m!, 11000, { abs: 1e-9 });
    expectClose(j.temperature_K!, 216.65, { abs: 1e-9 }, 'USSA 1976 Table 4');
    expectClose(j.pressure_Pa!, 22632.06, { abs: 0.01 }, 'USSA 1976 Table 4');
    for (const key of ['density_kg_m3', 'speedOfSound_m_s', 'theta', 'delta', 'sigma']) {
      expect(Number.isFinite(j[key]), key).toBe(true);
    }
    expect(j.mach).toBeUndefined();
  });
  it('adds airspeeds for a CAS at 35,000 ft, ISA+10', async () => {
    // 250 kt CAS at FL350: M = 0.741 (numpy reference of NACA 1135, test/reference/atmosphere_airspeed_reference.py
    // gives 264.42 kt CAS at M 0.78; here the CLI must agree with the engine's inversion).
    const j = await json('air', '--altitude', '35000 ft', '--isa-dev', '+10 K', '--cas', '250 kt');
    expectClose(j.pressureAltitude_m!, 10668, { abs: 1e-9 }, 'ft = 0.3048 m');
    expectClose(j.temperature_K!, 218.808 + 10, { abs: 1e-3 }, 'ICAO Doc 7488, 35,000 ft + 10 K');
    expectClose(j.cas_m_s!, (250 * 1852) / 3600, { rel: 1e-12 });
    for (const key of ['mach', 'eas_m_s', 'tas_m_s', 'dynamicPressure_Pa']) expect(Number.isFinite(j[key]), key).toBe(true);
    expectClose(j.tas_m_s!, j.mach! * j.speedOfSound_m_s!, { rel: 1e-12 }, 'TAS = M a');
  });
  it('gives 264.42 kt CAS for Mach 0.78 at 35,000 ft', async () => {
    const j = await json('air', '--altitude', '35000 ft', '--mach', '0.78');
    expectClose(j.cas_m_s! / (1852 / 3600), 264.42028, { abs: 1e-4 }, 'numpy reference (NACA 1135)');
  });
});

describe('blockwise air text output', () => {
  it('prints SI and customary columns and the safety notice', async () => {
    const r = await run('air', '--altitude', '35000 ft', '--tas', '450 kt');
    expect(r.code).toBe(0);
    expect(r.out).toContain('35,000 ft');
    expect(r.out).toContain('10,668.0 m');
    expect(r.out).toContain('450.0 kt');
    expect(r.out).toMatch(/Mach\s+0\.78/);
    expect(r.out).toContain('not approved flight-planning or performance data');
  });
  it('prints help with --help', async () => {
    const r = await run('air', '--help');
    expect(r.code).toBe(0);
    expect(r.out).toContain('--altitude');
    expect(r.out).toContain('--isa-dev');
  });
});

describe('blockwise air bad arguments exit 2 with one line naming the option', () => {
  const cases: readonly [string[], RegExp][] = [
    [['air'], /missing --altitude/],
    [['air', '--altitude', '35000 kt'], /--altitude: "35000 kt" is a speed, expected a length/],
    [['air', '--altitude', '35000 furlongs'], /--altitude: .*unknown unit "furlongs"/],
    [['air', '--altitude', '90 km'], /--altitude: "90 km" is out of range: expected a pressure altitude from -5004 m to 71000 m/],
    [['air', '--altitude', '1000 m', '--cas', '250 kt', '--mach', '0.5'], /give one speed, not --cas and --mach/],
    [['air', '--altitude', '1000 m', '--mach=-0.5'], /--mach: "-0.5" is out of range: expected a Mach number from 0 to 5/],
    [['air', '--altitude', '35000 ft', '--mach=1e308'], /--mach: "1e308" is 1\.00e\+308 in SI units, beyond any physical value/],
    [['air', '--altitude', '1000 m', '--isa-dev', '15 kPa'], /--isa-dev: "15 kPa" is a pressure, expected a temperature difference/],
    [['air', '--altitude', '11000 m', '--isa-dev=-300 K'], /--isa-dev: "-300 K" is out of range: expected an ISA deviation from -100 K to \+100 K/],
    // A value starting with a dash needs --option=value (node:util parseArgs); the message says so.
    [['air', '--altitude', '11000 m', '--isa-dev', '-5 K'], /--isa-dev/],
    [['air', '--altitude', '1000 m', '--tas', 'fast'], /--tas: "fast" does not start with a number/],
  ];
  for (const [argv, message] of cases) {
    it(`blockwise ${argv.join(' ')}`, async () => {
      const r = await run(...argv);
      expect(r.code).toBe(2);
      expect(r.out).toBe('');
      expect(r.err).toMatch(message);
      expect(r.err.trimEnd().split('\n')).toHaveLength(1);
    });
  }
});

describe('blockwise air as a separate process', () => {
  it('node bin/blockwise.mjs air --altitude "11000 m" --json agrees with the 1976 table', async () => {
    const { stdout } = await promisify(execFile)(process.execPath, ['bin/blockwise.mjs', 'air', '--altitude', '11000 m', '--json'], {
      cwd: repoRoot,
    });
    const j = JSON.parse(stdout) as Record<string, number>;
    // U.S. Standard Atmosphere 1976, Table 4: T = 216.65 K, p = 22,632 Pa at 11 km geopotential.
    expectClose(j.temperature_K!, 216.65, { abs: 1e-9 }, 'USSA 1976 Table 4');
    expectClose(j.pressure_Pa!, 22632, { abs: 0.5 }, 'USSA 1976 Table 4');
  }, 30000);
});
