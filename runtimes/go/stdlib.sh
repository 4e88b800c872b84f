# Prepared once per Go toolchain (compile.warm in runtime.yaml): writes $1, an importcfg that
# maps every package of the precompiled standard library to its archive, and $2, a shell file
# that names the toolchain's compiler and linker. With them the compile step runs the Go
# compiler and linker directly, as `go build` itself does, without starting the go command
# (which reads and hashes the standard library's sources to see that nothing is stale).
# Go 1.20 and later ship no precompiled standard library: then this fails, and the runtime
# compiles cold with `go build`.
set -eu
root=$(go env GOROOT)
archives="$root/pkg/$(go env GOOS)_$(go env GOARCH)"
tools=$(go env GOTOOLDIR)
if [ ! -f "$archives/fmt.a" ] || [ ! -x "$tools/compile" ] || [ ! -x "$tools/link" ]; then
  echo "no precompiled standard library in $archives" >&2
  exit 1
fi
(cd "$archives" && find . -name '*.a' | LC_ALL=C sort | sed -e 's#^\./##' -e 's#\.a$##') |
  while read -r package; do
    printf 'packagefile %s=%s/%s.a\n' "$package" "$archives" "$package"
  done > "$1"
printf 'go_compile=%s/compile\ngo_link=%s/link\n' "$tools" "$tools" > "$2"
