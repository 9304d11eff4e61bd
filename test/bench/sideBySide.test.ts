import { describe, expect, it } from 'vitest';
import { formatSideBySide, median, parsePeerOutput, type SideBySide } from './sideBySide';

const PEER_LINE = JSON.stringify({
  blockFuel_kg: 5425,
  tripFuel_kg: 5320,
  blockTime_s: 25650,
  tripTime_s: 24750,
  reserveFuel_kg: 1014,
  repeat: 3,
  missionWall_s: [6, 7, 8],
  medianMission_s: 7,
});

describe('side by side with the Python peer (no timing assertions)', () => {
  it('median of an odd and an even list', () => {
    expect(median([3, 1, 2])).toBe(2);
    expect(median([4, 1, 3, 2])).toBe(2.5);
  });

  it('parsePeerOutput reads the last line of the peer as JSON', () => {
    const r = parsePeerOutput(`warning: something\n${PEER_LINE}\n`);
    expect(typeof r).toBe('object');
    if (typeof r === 'object') expect(r.blockFuel_kg).toBe(5425);
  });

  it('parsePeerOutput says what is wrong with bad output', () => {
    expect(parsePeerOutput('Traceback (most recent call last)')).toMatch(/printed no JSON/);
    expect(parsePeerOutput(JSON.stringify({ ...JSON.parse(PEER_LINE), blockFuel_kg: null }))).toMatch(/"blockFuel_kg"/);
    expect(parsePeerOutput(JSON.stringify({ ...JSON.parse(PEER_LINE), missionWall_s: 3 }))).toMatch(/missionWall_s/);
  });

  it('formatSideBySide prints cores, both times, the ratio and the block-fuel difference', () => {
    const r: SideBySide = {
      cores: 2,
      blockwise: { runs: 15, medianMission_s: 0.1, blockFuel_kg: 5000, tripFuel_kg: 4900, blockTime_s: 25000 },
      peer: { ...(parsePeerOutput(PEER_LINE) as Exclude<ReturnType<typeof parsePeerOutput>, string>), blockFuel_kg: 5010, tripFuel_kg: 4900, process_s: 24 },
    };
    const text = formatSideBySide(r);
    expect(text).toContain('2 cores');
    expect(text).toContain('100.0 ms');
    // 7 s / 0.1 s = 70; (5010 - 5000) / 5000 = +0.200 %.
    expect(text).toContain('70.0 x');
    expect(text).toContain('+0.200 %');
    // start-up = 24 s - (6 + 7 + 8) s = 3 s
    expect(text).toContain('about 3.00 s');
  });

  it('formatSideBySide says why the peer did not run', () => {
    const text = formatSideBySide({ cores: 2, blockwise: { runs: 1, medianMission_s: 0.1, blockFuel_kg: 1, tripFuel_kg: 1, blockTime_s: 1 }, peer: { error: 'python3 could not be started: ENOENT' } });
    expect(text).toContain('not run (python3 could not be started: ENOENT)');
  });
});
