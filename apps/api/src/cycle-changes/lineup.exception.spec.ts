import { LaunchMathInputError } from '@catline/launch-math';
import { LineupException, asLaunchDataRefusal } from './lineup.exception.js';

describe('asLaunchDataRefusal', () => {
  it('turns launch-math refusing the stored data into a 422 with its message', () => {
    const refusal = asLaunchDataRefusal(new LaunchMathInputError('Table rows must be in strictly ascending order'));
    expect(refusal).toBeInstanceOf(LineupException);
    expect((refusal as LineupException).getStatus()).toBe(422);
    expect((refusal as LineupException).code).toBe('launch_data_invalid');
    expect((refusal as LineupException).message).toBe(
      'The launch figures cannot be computed from the stored data: Table rows must be in strictly ascending order.',
    );
  });

  it('leaves every other error as it is', () => {
    const error = new Error('connection lost');
    expect(asLaunchDataRefusal(error)).toBe(error);
  });
});
