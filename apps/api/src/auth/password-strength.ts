import { HttpStatus } from '@nestjs/common';
import { ZxcvbnFactory } from '@zxcvbn-ts/core';
import * as common from '@zxcvbn-ts/language-common';
import * as english from '@zxcvbn-ts/language-en';
import { DomainException } from '../common/errors/domain.exception.js';

/**
 * A new password is refused when zxcvbn-ts, with its offline common-password and English word lists,
 * rates it below 3 of 4 ("safely unguessable", about 10^8 guesses on the package's own scale). The
 * person's e-mail, its parts, their name and the app's own name count as words to avoid, so none of
 * them helps a password pass.
 */
export const MIN_PASSWORD_SCORE = 3;

const strength = new ZxcvbnFactory({
  dictionary: { ...common.dictionary, ...english.dictionary },
  graphs: common.adjacencyGraphs,
  translations: english.translations,
});

export interface PasswordOwner {
  email: string;
  name: string;
}

function wordsToAvoid({ email, name }: PasswordOwner): string[] {
  const parts = [...email.split(/[@.+_-]/), ...name.split(/\s+/)].filter((part) => part.length >= 3);
  return ['catline', email, name, ...parts];
}

/** Refuses, with a sentence that says why, a password too easy to guess for this person. */
export function assertStrongPassword(password: string, owner: PasswordOwner): void {
  const result = strength.check(password, wordsToAvoid(owner));
  if (result.score >= MIN_PASSWORD_SCORE) return;
  const why = result.feedback.warning ? ` ${result.feedback.warning}` : '';
  throw new DomainException(
    HttpStatus.BAD_REQUEST,
    'weak_password',
    `This password is too easy to guess.${why} Choose a longer phrase of unrelated words, without your e-mail or name.`,
  );
}
