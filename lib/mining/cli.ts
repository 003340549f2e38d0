// `npm run --silent mine -- FILE...`: one contract line per file on stdout, nothing else.
import { readFile, stat } from "node:fs/promises";
import { ContractLine, createMiner, isErrorLine } from "./index";

// pdf.js and other libraries may print warnings through console; stdout is reserved for contract lines.
for (const k of ["log", "info", "warn", "debug"] as const) console[k] = (...args: unknown[]) => console.error(...args);

async function main(files: string[]): Promise<number> {
  if (files.length === 0) {
    process.stderr.write("usage: npm run --silent mine -- FILE...\n");
    return 2;
  }
  const miner = createMiner();
  let failed = false;
  for (const file of files) {
    let line: ContractLine;
    try {
      const st = await stat(file);
      if (!st.isFile()) line = { file, error: { code: "not_found", message: `${file} is not a regular file.` } };
      else line = (await miner.mine({ data: new Uint8Array(await readFile(file)), filename: file })).line;
    } catch (err) {
      const code = (err as NodeJS.ErrnoException).code;
      line = {
        file,
        error: {
          code: "not_found",
          message: code === "ENOENT" ? `No such file: ${file}` : `Cannot read ${file}: ${String(err)}`,
        },
      };
    }
    const checked = ContractLine.parse(line);
    if (isErrorLine(checked)) failed = true;
    process.stdout.write(`${JSON.stringify(checked)}\n`);
  }
  await miner.close();
  return failed ? 2 : 0;
}

main(process.argv.slice(2)).then(
  (code) => {
    process.exitCode = code;
  },
  (err: unknown) => {
    process.stderr.write(`mine: ${String(err)}\n`);
    process.exitCode = 2;
  },
);
