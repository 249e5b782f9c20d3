/** Where commands read the time: the system clock in the app, a set clock when the demo history is built. */
export abstract class Clock {
  abstract now(): Date;
}

export class SystemClock extends Clock {
  now(): Date {
    return new Date();
  }
}
