// A pending waist change on a saved leg moves the printed pin mark: rule 'girth-slope', rise =
// change × D/(S − W) (derived, docs/KINDS.md), rounded to the sheet's step and added to the pin
// as printed, so pin + move = mark holds on the page.
import { describe, expect, it } from 'vitest';
import { waistNoteOf } from '@/lib/server/fitting/waist-note';

const body = { waistGirth: '34', seatGirth: '40' };

describe('waistNoteOf', () => {
  it('is null with no pending waist change', () => {
    expect(waistNoteOf({ backPin: '31 1/2', ...body, waistToSeat: '9' }, 'in', 16)).toBeNull();
  });

  it('in a shop that alters the waist first, moves no mark and needs no girths (engine policy waist-first)', () => {
    const note = waistNoteOf({ waistChange: '-1 1/4' }, 'in', 16, 'waist-first')!;
    expect(note).toMatchObject({ code: 'first', change: '-1 1/4 in', by: '', pin: '', mark: '', direction: 'none' });
    expect(note.source).toMatch(/adjust the waist before pinning/);
  });

  it('taken in 1 in moves the mark down by 1 × 9/(40 − 34) = 1 1/2 in, from 31 1/2 to 33 in', () => {
    // Check values by hand from the derived rule (docs/KINDS.md): 9/6 = 1 1/2; 31 1/2 + 1 1/2 = 33.
    const note = waistNoteOf({ backPin: '31 1/2', waistChange: '-1', ...body, waistToSeat: '9' }, 'in', 16)!;
    expect(note).toMatchObject({ code: 'moves', direction: 'down', by: '1 1/2 in', pin: '31 1/2 in', mark: '33 in', rule: 'girth-slope' });
    expect(note.source).toMatch(/derived/);
  });

  it('rounds the move to the step and adds it to the pin as printed (4/3 in → 1 5/16, mark 32 13/16)', () => {
    // By hand: 1 × 8/6 = 1.333 in = 21.33 sixteenths → 21/16 = 1 5/16; 31 1/2 + 1 5/16 = 32 13/16.
    const note = waistNoteOf({ backPin: '31 1/2', waistChange: '-1', ...body, waistToSeat: '8' }, 'in', 16)!;
    expect(note).toMatchObject({ by: '1 5/16 in', mark: '32 13/16 in' });
    // At eighths: 10.67 eighths → 11/8 = 1 3/8; 31 1/2 + 1 3/8 = 32 7/8.
    expect(waistNoteOf({ backPin: '31 1/2', waistChange: '-1', ...body, waistToSeat: '8' }, 'in', 8)).toMatchObject({ by: '1 3/8 in', mark: '32 7/8 in' });
  });

  it('let out moves the mark up', () => {
    // By hand: let out 2 cm × 180/(1000 − 880) = 3 cm up; 800 − 30 = 770 mm.
    const note = waistNoteOf({ backPin: '800', waistChange: '20', waistGirth: '880', seatGirth: '1000', waistToSeat: '180' }, 'mm', 16)!;
    expect(note).toMatchObject({ code: 'moves', direction: 'up', by: '30 mm', mark: '770 mm' });
  });

  it('asks for the body measurements the rule needs rather than guessing', () => {
    expect(waistNoteOf({ backPin: '31 1/2', waistChange: '-1' }, 'in', 16)).toMatchObject({ code: 'needs', change: '-1 in' });
    expect(waistNoteOf({ backPin: '31 1/2', waistChange: '-1', waistGirth: '40', seatGirth: '34', waistToSeat: '8' }, 'in', 16)?.code).toBe('needs');
  });
});
