import { describe, expect, it } from 'vitest';
import { IPC_CHANNELS } from '../../electron/ipcChannels';
import { IPC_PAYLOADS, MAX_TEXT_CHARS, describePayloadIssues } from '../../electron/ipcSchemas';

// Every invoke channel has a schema, and the schemas refuse what the shell
// must never act on (Electron security checklist: validate IPC input).

describe('IPC_PAYLOADS', () => {
  it('IPC_PAYLOADS has a schema for every channel except the main-to-page menu channel', () => {
    const channels = Object.keys(IPC_CHANNELS).filter((k) => k !== 'menuCommand').sort();
    expect(Object.keys(IPC_PAYLOADS).sort()).toEqual(channels);
  });

  it('IPC_PAYLOADS refuses a project text longer than MAX_TEXT_CHARS', () => {
    const long = 'x'.repeat(MAX_TEXT_CHARS + 1);
    const r = IPC_PAYLOADS.saveProject.safeParse([long, 'p']);
    expect(r.success).toBe(false);
    if (!r.success) expect(describePayloadIssues(r.error)).toMatch(/^argument 0: text longer than/);
    expect(IPC_PAYLOADS.saveProject.safeParse(['x'.repeat(1000), 'p']).success).toBe(true);
  });

  it('IPC_PAYLOADS accepts ordinary file names with spaces, dots and non-ASCII letters', () => {
    for (const name of ['Demo jet', 'study.v2.blockwise.json', 'Étude A–B']) {
      expect(IPC_PAYLOADS.exportResultsCsv.safeParse(['a', name]).success, name).toBe(true);
    }
  });

  it('IPC_PAYLOADS refuses non-string paths and objects where text is expected', () => {
    expect(IPC_PAYLOADS.openRecent.safeParse([{ path: '/a' }]).success).toBe(false);
    expect(IPC_PAYLOADS.openRecent.safeParse(['']).success).toBe(false);
    expect(IPC_PAYLOADS.autosave.safeParse(['p', { toString: () => 'x' }]).success).toBe(false);
    expect(IPC_PAYLOADS.printReportPdf.safeParse([]).success).toBe(false);
  });
});

describe('IPC_PAYLOADS.readBesideProject', () => {
  it('IPC_PAYLOADS.readBesideProject accepts relative paths and refuses absolute ones', () => {
    expect(IPC_PAYLOADS.readBesideProject.safeParse(['demo-engine.deck.csv']).success).toBe(true);
    expect(IPC_PAYLOADS.readBesideProject.safeParse(['decks/a.csv']).success).toBe(true);
    for (const p of ['/etc/passwd', '\\\\server\\share\\a.csv', 'C:\\decks\\a.csv', 'a\u0000.csv', '']) {
      expect(IPC_PAYLOADS.readBesideProject.safeParse([p]).success, JSON.stringify(p)).toBe(false);
    }
  });
});

describe('describePayloadIssues', () => {
  it('describePayloadIssues names the argument path of each problem', () => {
    const r = IPC_PAYLOADS.documentState.safeParse([{ name: 5, dirty: 'no' }]);
    expect(r.success).toBe(false);
    if (!r.success) {
      const text = describePayloadIssues(r.error);
      expect(text).toContain('argument 0.name:');
      expect(text).toContain('argument 0.dirty:');
    }
  });
});
