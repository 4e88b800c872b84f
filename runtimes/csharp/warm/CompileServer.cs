// Assay's warm C# compiler: one Mono process that stays up for many candidates and runs Mono's
// C# compiler (mcs.exe, loaded once as a library) on each, so a candidate pays for the
// compiler's work, not for starting Mono and compiling the compiler's own code again. Started
// by harness/sandbox/warm_compilers.py inside a sandbox of its own (no network, no host
// files); it never runs what it compiles.
//
// Protocol, on stdin and stdout: every field is its length in bytes as decimal digits, a
// newline, then the bytes. The request "hello" is answered "ready" once the server is up. A
// request is the field "compile", the number of arguments, the arguments (the runtime's cold
// compile command: mcs and its options), the number of files and each file's name and bytes.
// The server empties its work dir (its current directory), writes the files, and runs mcs's
// entry point for callers in the same process (Mono.CSharp.CompilerCallableEntryPoint
// .InvokeCompiler: the command-line parser and the driver that mcs's Main runs, with the
// compiler's static state reset after each compile). mcs's Main itself ends the process
// (Environment.Exit), so what Main adds is done here as it does it: messages on stderr, the
// line "Compilation failed: N error(s), M warnings" (or "Compilation succeeded - M
// warning(s)") on stdout, exit status 1 or 0. The reply is the field "done", the exit status,
// that stdout and stderr, and every file left in the work dir (name and bytes). An exception
// out of the compiler ends the server after a reply with status 70: a crashed compiler is not
// trusted with the next candidate.

using System;
using System.Collections.Generic;
using System.IO;
using System.Linq;
using System.Reflection;
using System.Text;

static class CompileServer
{
    const int MaxField = 64 << 20;
    static readonly Encoding Utf8 = new UTF8Encoding(false);

    static int Main(string[] args)
    {
        string compilerPath = args.Length > 0 ? args[0] : "/usr/lib/mono/4.5/mcs.exe";
        Assembly compiler = Assembly.LoadFrom(compilerPath);
        MethodInfo invoke = compiler.GetType("Mono.CSharp.CompilerCallableEntryPoint", true).GetMethod(
            "InvokeCompiler", BindingFlags.Public | BindingFlags.Static, null,
            new[] { typeof(string[]), typeof(TextWriter) }, null);
        Stream input = new BufferedStream(Console.OpenStandardInput(), 1 << 16);
        Stream output = Console.OpenStandardOutput();
        string work = Directory.GetCurrentDirectory();
        while (true)
        {
            byte[] first = Field(input);
            if (first == null) return 0; // the harness closed the channel
            string op = Utf8.GetString(first);
            if (op == "hello")
            {
                Send(output, new List<byte[]> { Utf8.GetBytes("ready") });
                continue;
            }
            if (op != "compile") throw new IOException("unknown request " + op);
            int argc = Number(input);
            var command = new List<string>();
            for (int i = 0; i < argc; i++) command.Add(Utf8.GetString(Need(input)));
            int files = Number(input);
            Empty(work);
            var inputs = new HashSet<string>();
            for (int i = 0; i < files; i++)
            {
                string name = Plain(Utf8.GetString(Need(input)));
                File.WriteAllBytes(Path.Combine(work, name), Need(input));
                inputs.Add(name);
            }
            var stdout = new StringWriter();
            var stderr = new StringWriter();
            TextWriter oldOut = Console.Out, oldErr = Console.Error;
            int status;
            bool crashed = false;
            Console.SetOut(stdout);
            Console.SetError(stderr);
            try
            {
                bool ok = (bool)invoke.Invoke(null, new object[] { command.Skip(1).ToArray(), stderr });
                string said = stderr.ToString();
                int errors = Count(said, "error CS"), warnings = Count(said, "warning CS");
                ok = ok && errors == 0;
                if (!ok)
                    stdout.WriteLine("Compilation failed: {0} error(s), {1} warnings", errors, warnings);
                else if (warnings > 0)
                    stdout.WriteLine("Compilation succeeded - {0} warning(s)", warnings);
                status = ok ? 0 : 1;
            }
            catch (Exception error)
            {
                stderr.WriteLine(error);
                status = 70;
                crashed = true;
            }
            finally
            {
                Console.Out.Flush();
                Console.SetOut(oldOut);
                Console.SetError(oldErr);
            }
            var reply = new List<byte[]> {
                Utf8.GetBytes("done"), Utf8.GetBytes(status.ToString()),
                Utf8.GetBytes(stdout.ToString()), Utf8.GetBytes(stderr.ToString()) };
            var made = Directory.GetFiles(work).Select(Path.GetFileName)
                .Where(n => !inputs.Contains(n)).OrderBy(n => n, StringComparer.Ordinal).ToList();
            reply.Add(Utf8.GetBytes(made.Count.ToString()));
            foreach (string name in made)
            {
                reply.Add(Utf8.GetBytes(name));
                reply.Add(File.ReadAllBytes(Path.Combine(work, name)));
            }
            Send(output, reply);
            if (crashed) return 70;
        }
    }

    /// <summary>Messages of one kind: "file(line,col): error CS0029: ..." or "error CS2001: ...".</summary>
    static int Count(string messages, string kind)
    {
        return messages.Split('\n').Count(line => line.StartsWith(kind) || line.Contains("): " + kind));
    }

    static void Send(Stream output, List<byte[]> fields)
    {
        foreach (byte[] data in fields)
        {
            byte[] head = Encoding.ASCII.GetBytes(data.Length + "\n");
            output.Write(head, 0, head.Length);
            output.Write(data, 0, data.Length);
        }
        output.Flush();
    }

    static string Plain(string name)
    {
        if (name.Length == 0 || name.Contains("/") || name == "." || name == "..")
            throw new IOException("not a plain file name: " + name);
        return name;
    }

    static void Empty(string folder)
    {
        foreach (string file in Directory.GetFiles(folder)) File.Delete(file);
        foreach (string dir in Directory.GetDirectories(folder)) Directory.Delete(dir, true);
    }

    static int Number(Stream input)
    {
        return int.Parse(Utf8.GetString(Need(input)));
    }

    static byte[] Need(Stream input)
    {
        byte[] data = Field(input);
        if (data == null) throw new EndOfStreamException();
        return data;
    }

    static byte[] Field(Stream input)
    {
        int length = 0, digits = 0;
        while (true)
        {
            int c = input.ReadByte();
            if (c < 0)
            {
                if (digits == 0) return null;
                throw new EndOfStreamException();
            }
            if (c == '\n') break;
            if (c < '0' || c > '9' || ++digits > 9) throw new IOException("bad field length");
            length = length * 10 + (c - '0');
        }
        if (digits == 0 || length > MaxField) throw new IOException("bad field length");
        byte[] data = new byte[length];
        int read = 0;
        while (read < length)
        {
            int n = input.Read(data, read, length - read);
            if (n <= 0) throw new EndOfStreamException();
            read += n;
        }
        return data;
    }
}
