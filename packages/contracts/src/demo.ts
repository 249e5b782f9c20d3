/**
 * The password of every person the demo seed creates, read by the seed, the start banner, the tests and
 * the benches. An invented passphrase that passes the server's password strength rule.
 */
export const DEMO_PASSWORD = 'kelp-tundra-okapi-41';
