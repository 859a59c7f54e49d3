/** Placeholder until the speed benchmark is written (another part of the work replaces this file). */
export async function run(_args: readonly string[] = []): Promise<number> {
  console.error('speed bench not written yet');
  return 1;
}
