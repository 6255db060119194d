import { BaseSequencer, type TestSpecification } from 'vitest/node';

/** Files in the default order, except the log check, which reads what all the others made the server write. */
export default class LogsLastSequencer extends BaseSequencer {
  async sort(files: TestSpecification[]): Promise<TestSpecification[]> {
    const sorted = await super.sort(files);
    const isLogs = (f: TestSpecification) => f.moduleId.endsWith('/logs.test.ts');
    return [...sorted.filter((f) => !isLogs(f)), ...sorted.filter(isLogs)];
  }
}
