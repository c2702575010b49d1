import { describe, expect, it } from 'vitest';
import { addPhotos, reportFormSchema, shopInstant, shopNowLocal } from './report-form';

const file = (name: string, type: string, size = 1000) => new File([new Uint8Array(size)], name, { type });

describe('shopInstant', () => {
  it('reads the time on the shop’s wall clock, across the daylight-saving change', () => {
    // IANA tz database via Intl: America/Chicago is UTC−6 in winter and UTC−5 in summer.
    expect(shopInstant('2026-01-15T14:30', 'America/Chicago')).toBe('2026-01-15T20:30:00.000Z');
    expect(shopInstant('2026-07-15T14:30', 'America/Chicago')).toBe('2026-07-15T19:30:00.000Z');
  });

  it('answers null for a value that names no time', () => {
    expect(shopInstant('', 'America/Chicago')).toBeNull();
    expect(shopInstant('yesterday', 'America/Chicago')).toBeNull();
  });
});

describe('shopNowLocal', () => {
  it('gives the shop’s date and clock, not the device’s', () => {
    // IANA tz database via Intl: Pacific/Auckland is UTC+13 in January (daylight saving).
    expect(shopNowLocal('Pacific/Auckland', new Date('2026-01-15T20:30:00Z'))).toBe('2026-01-16T09:30');
  });
});

describe('reportFormSchema', () => {
  const values = {
    occurredAt: '2026-01-15T14:30',
    areaId: '',
    location: 'Weld bay',
    machineId: '',
    kind: 'near_miss',
    description: 'A spark curtain was left open beside the bench.',
    firstAid: '',
  };

  it('turns the form into the report the server takes, empty fields left out', () => {
    const parsed = reportFormSchema('America/Chicago').parse(values);
    expect(parsed).toEqual({
      occurredAt: '2026-01-15T20:30:00.000Z',
      location: 'Weld bay',
      kind: 'near_miss',
      description: 'A spark curtain was left open beside the bench.',
    });
  });

  it('names each field that is missing', () => {
    const result = reportFormSchema('America/Chicago').safeParse({ ...values, occurredAt: '', location: '', kind: null, description: '' });
    expect(result.success).toBe(false);
    const paths = result.error!.issues.map((issue) => issue.path.join('.')).sort();
    expect(paths).toEqual(['description', 'kind', 'location', 'occurredAt']);
  });
});

describe('addPhotos', () => {
  it('keeps JPEG and PNG pictures up to five, and says why each other file was left out', () => {
    const current = [file('1.png', 'image/png'), file('2.jpg', 'image/jpeg'), file('3.png', 'image/png'), file('4.png', 'image/png')];
    const { photos, refused } = addPhotos(current, [
      file('clip.mov', 'video/quicktime'),
      file('huge.jpg', 'image/jpeg', 10 * 1024 * 1024 + 1),
      file('5.jpg', 'image/jpeg'),
      file('6.jpg', 'image/jpeg'),
    ]);
    expect(photos.map((photo) => photo.name)).toEqual(['1.png', '2.jpg', '3.png', '4.png', '5.jpg']);
    expect(refused).toEqual([
      'clip.mov is not a JPEG or PNG picture.',
      expect.stringMatching(/^huge\.jpg is larger than 10 MB\.$/),
      '6.jpg was left out: a report takes at most 5 photos.',
    ]);
  });
});
