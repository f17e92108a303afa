export {};
// `latchet <command> [options]`: each command lives in its own module under commands/ and
// exports `run(argv: string[]): Promise<number>` returning the exit code (2 = bad input).
const commands: Record<string, () => Promise<{ run(argv: string[]): Promise<number> }>> = {
  layout: () => import('./commands/layout.ts'),
  spec: () => import('./commands/spec.ts'),
  svg: () => import('./commands/svg.ts'),
  print: () => import('./commands/print.ts'),
};

const [name, ...rest] = process.argv.slice(2);
const load = name ? commands[name] : undefined;
if (!load) {
  console.error(`usage: latchet <${Object.keys(commands).join('|')}> [options]`);
  process.exit(2);
}
process.exitCode = await (await load()).run(rest);
