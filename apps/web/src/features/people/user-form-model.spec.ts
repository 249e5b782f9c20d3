import { describe, expect, it } from 'vitest';
import { blankUser, userSchema } from './user-form-model.js';

const person = { ...blankUser, name: ' Ira Invitee ', email: 'ira@catline.example' };

describe('adding a person', () => {
  it('sends an invitation when no password is given', () => {
    expect(userSchema.parse(person)).toEqual({
      name: 'Ira Invitee',
      email: 'ira@catline.example',
      role: 'observer',
      password: undefined,
      catapultId: undefined,
      squadronId: undefined,
    });
  });

  it('wants a catapult for a catapult officer and sends only the fields the role uses', () => {
    expect(
      userSchema
        .safeParse({ ...person, role: 'catapult_officer', squadronId: '2' })
        .error?.issues.map((issue) => [issue.path.join('.'), issue.message]),
    ).toEqual([['catapultId', 'A catapult officer works one catapult: pick it.']]);
    expect(userSchema.parse({ ...person, role: 'catapult_officer', catapultId: '3', squadronId: '2' })).toMatchObject({
      catapultId: 3,
      squadronId: undefined,
    });
    expect(userSchema.parse({ ...person, role: 'pilot', catapultId: '3', squadronId: '2' })).toMatchObject({
      catapultId: undefined,
      squadronId: 2,
    });
  });

  it('binds a deck edge operator to a catapult too', () => {
    expect(
      userSchema.safeParse({ ...person, role: 'deck_edge_operator' }).error?.issues.map((issue) => issue.message),
    ).toEqual(['A deck edge operator works one catapult: pick it.']);
    expect(userSchema.parse({ ...person, role: 'deck_edge_operator', catapultId: '2' })).toMatchObject({
      catapultId: 2,
    });
  });

  it('takes a first password of at least 12 characters', () => {
    expect(
      userSchema.safeParse({ ...person, password: 'eleven char' }).error?.issues.map((issue) => issue.message),
    ).toEqual(['At least 12 characters, or leave it empty to send an invitation.']);
    expect(userSchema.parse({ ...person, password: 'twelve chars' }).password).toBe('twelve chars');
  });
});
