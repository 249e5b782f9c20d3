/** The integration tests' own database: the app's name with `_test`. */
export function testDatabaseName(appDatabase) {
  return appDatabase.endsWith('_test') ? appDatabase : `${appDatabase}_test`;
}
