export function testDatabaseName(appDatabase: string): string;
