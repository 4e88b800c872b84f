// Assay's warm TypeScript compiler: one Node process that stays up for many candidates and
// type-checks and emits each with the compiler's API, so a candidate pays for checking its own
// file, not for starting Node, loading the compiler and parsing the standard lib files again.
// Started by harness/sandbox/warm_compilers.py inside a sandbox of its own (no network, no host
// files); it never runs what it compiles (tsc has no plugins or transformers on the command line).
//
// Protocol, on stdin and stdout: every field is its length in bytes as decimal digits, a
// newline, then the bytes. The request "hello" is answered "ready" once the server is up. A
// request is the field "compile", the number of arguments, the arguments (the runtime's cold
// compile command: tsc and its options), the number of files and
// each file's name and bytes. The server empties its work dir (its current directory), writes
// the files, and compiles as the tsc command does with those arguments (tsc's own
// performCompilation, step by step: the same options, program, diagnostics, their order and
// text, and exit status); the one difference is that the parsed lib files (lib.es2023.d.ts and
// the files it references) are kept from one candidate to the next. The reply is the field
// "done", the exit status, what tsc would print on stdout and on stderr, and every file left in
// the work dir (name and bytes). A command this server does not reproduce (a tsconfig project,
// watch or incremental mode, --help, a pretty or localised report...) is refused: the server
// exits with a message, and the harness compiles that runtime's candidates cold.

"use strict";

const fs = require("fs");
const path = require("path");

const MAX_FIELD = 64 << 20;

function findTypeScript() {
  // The compiler the cold command runs: `tsc` on PATH, resolved to its package.
  for (const dir of (process.env.PATH || "").split(path.delimiter)) {
    const candidate = path.join(dir || ".", "tsc");
    if (fs.existsSync(candidate)) {
      let root = path.dirname(path.dirname(fs.realpathSync(candidate)));
      return require(root);
    }
  }
  throw new Error("tsc is not on PATH");
}

const ts = findTypeScript();
const work = process.cwd();
const libCache = new Map();

function refuse(message) {
  process.stderr.write(`compile server: ${message}\n`);
  process.exit(70);
}

function plainCommand(commandLine) {
  const o = commandLine.options;
  const unsupported = ["locale", "init", "version", "help", "all", "watch", "project", "build", "showConfig",
                       "incremental", "composite", "tsBuildInfoFile", "listFilesOnly", "diagnostics",
                       "extendedDiagnostics", "generateCpuProfile", "generateTrace", "explainFiles",
                       "listFiles", "listEmittedFiles", "traceResolution", "plugins"];
  const used = unsupported.filter((name) => o[name] !== undefined);
  if (used.length) refuse(`options this server does not reproduce: ${used.join(", ")}`);
  if (o.pretty !== false) refuse("the command must say --pretty false");
  if (commandLine.fileNames.length === 0) refuse("the command names no source files");
}

function compile(args) {
  let stdout = "";
  const write = (s) => { stdout += s; };
  const formatHost = {
    getCurrentDirectory: () => work,
    getNewLine: () => ts.sys.newLine,
    getCanonicalFileName: ts.createGetCanonicalFileName(ts.sys.useCaseSensitiveFileNames),
  };
  const report = (diagnostic) => write(ts.formatDiagnostic(diagnostic, formatHost));
  const commandLine = ts.parseCommandLine(args);
  if (commandLine.errors.length > 0) {
    commandLine.errors.forEach(report);
    return { status: 1, stdout };
  }
  plainCommand(commandLine);
  const options = ts.convertToOptionsWithAbsolutePaths(commandLine.options,
    (fileName) => ts.getNormalizedAbsolutePath(fileName, work));
  const host = ts.createCompilerHost(options);
  host.jsDocParsingMode = ts.JSDocParsingMode.ParseForTypeErrors; // tsc's default
  const libFolder = path.dirname(ts.getDefaultLibFilePath(options)) + path.sep;
  const getSourceFile = host.getSourceFile;
  host.getSourceFile = (fileName, languageVersion, onError, shouldCreate) => {
    if (!fileName.startsWith(libFolder)) {
      return getSourceFile.call(host, fileName, languageVersion, onError, shouldCreate);
    }
    const settings = typeof languageVersion === "object" ? languageVersion : { languageVersion };
    const key = JSON.stringify([fileName, settings.languageVersion, settings.impliedNodeFormat,
                                settings.jsDocParsingMode]);
    let file = libCache.get(key);
    if (file === undefined) {
      file = getSourceFile.call(host, fileName, languageVersion, onError, shouldCreate);
      if (file !== undefined) libCache.set(key, file);
    }
    return file;
  };
  const program = ts.createProgram({
    rootNames: commandLine.fileNames,
    options,
    projectReferences: commandLine.projectReferences,
    host,
    configFileParsingDiagnostics: [],
  });
  // tsc's emitFilesAndReportErrors, for a program without a config file.
  const all = [];
  all.push(...program.getSyntacticDiagnostics());
  if (all.length === 0) {
    all.push(...program.getOptionsDiagnostics());
    all.push(...program.getGlobalDiagnostics());
    if (all.length === 0) {
      all.push(...program.getSemanticDiagnostics());
    }
    if (options.noEmit && (options.declaration || options.composite) && all.length === 0) {
      all.push(...program.getDeclarationDiagnostics());
    }
  }
  const emitted = program.emit();
  all.push(...emitted.diagnostics);
  const diagnostics = ts.sortAndDeduplicateDiagnostics(all);
  diagnostics.forEach(report);
  let status = 0;
  if (emitted.emitSkipped && diagnostics.length > 0) status = 1;
  else if (diagnostics.length > 0) status = 2;
  return { status, stdout };
}

// --- the protocol ---

let buffer = Buffer.alloc(0);
let waiting = null;

function need(count) {
  return new Promise((resolve, reject) => {
    const attempt = () => {
      if (buffer.length >= count) {
        const out = buffer.subarray(0, count);
        buffer = buffer.subarray(count);
        resolve(out);
        return true;
      }
      return false;
    };
    if (!attempt()) waiting = { attempt, reject };
  });
}

process.stdin.on("data", (chunk) => {
  buffer = Buffer.concat([buffer, chunk]);
  if (waiting && waiting.attempt()) waiting = null;
});
process.stdin.on("end", () => process.exit(0));

async function field() {
  let digits = "";
  for (;;) {
    const c = (await need(1))[0];
    if (c === 10) break;
    if (c < 48 || c > 57 || digits.length >= 9) throw new Error("bad field length");
    digits += String.fromCharCode(c);
  }
  const length = Number(digits);
  if (!digits || length > MAX_FIELD) throw new Error("bad field length");
  return Buffer.from(await need(length));
}

function frame(data) {
  const bytes = Buffer.isBuffer(data) ? data : Buffer.from(String(data), "utf8");
  return [Buffer.from(`${bytes.length}\n`, "ascii"), bytes];
}

function plainName(name) {
  if (!name || name.includes("/") || name === "." || name === "..") throw new Error(`not a plain file name: ${name}`);
  return name;
}

function empty(folder) {
  for (const name of fs.readdirSync(folder)) {
    fs.rmSync(path.join(folder, name), { recursive: true, force: true });
  }
}

async function serve() {
  for (;;) {
    const op = (await field()).toString("utf8");
    if (op === "hello") {
      await new Promise((resolve, reject) => process.stdout.write(Buffer.concat(frame("ready")), (e) => e ? reject(e) : resolve()));
      continue;
    }
    if (op !== "compile") throw new Error(`unknown request ${op}`);
    const argc = Number((await field()).toString("utf8"));
    const argv = [];
    for (let i = 0; i < argc; i++) argv.push((await field()).toString("utf8"));
    const count = Number((await field()).toString("utf8"));
    empty(work);
    const inputs = new Set();
    for (let i = 0; i < count; i++) {
      const name = plainName((await field()).toString("utf8"));
      fs.writeFileSync(path.join(work, name), await field());
      inputs.add(name);
    }
    const { status, stdout } = compile(argv.slice(1));
    const parts = [...frame("done"), ...frame(status), ...frame(stdout), ...frame("")];
    const made = fs.readdirSync(work).filter((name) => !inputs.has(name)).sort()
      .filter((name) => fs.lstatSync(path.join(work, name)).isFile());
    parts.push(...frame(made.length));
    for (const name of made) parts.push(...frame(name), ...frame(fs.readFileSync(path.join(work, name))));
    await new Promise((resolve, reject) => process.stdout.write(Buffer.concat(parts), (e) => e ? reject(e) : resolve()));
  }
}

serve().catch((error) => {
  process.stderr.write(`compile server: ${error && error.stack || error}\n`);
  process.exit(70);
});
