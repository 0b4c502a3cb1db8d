#!/usr/bin/env bash
# tests/hardening/check_hardening.sh <path to libtubeheat.so>
#
# Checks the built shared library for the hardening that lib/CMakeLists.txt
# asks for, and for a small attack surface:
#   1. full RELRO: a GNU_RELRO program header (readelf -l) and immediate
#      binding, BIND_NOW in FLAGS or NOW in FLAGS_1 (readelf -d), so the GOT
#      is read-only after loading (-Wl,-z,relro -Wl,-z,now);
#   2. no executable stack: the GNU_STACK program header exists and is not
#      executable (flags RW, not RWE) (-Wl,-z,noexecstack);
#   3. no text relocations (no TEXTREL in the dynamic section);
#   4. stack protector / fortify: the library imports __stack_chk_fail
#      (-fstack-protector-strong found a function to protect) or a
#      fortified *_chk function (_FORTIFY_SOURCE); at least one of the two
#      must be present. Both findings are printed: fortify only produces
#      *_chk imports where a libc string/memory call has a size the
#      compiler knows, so their absence alone is not an error;
#   5. no file, network or process functions imported (nm -D
#      --undefined-only): the library computes and returns numbers, so it
#      has no business opening files or sockets, spawning processes or
#      loading code. Forbidden: open/openat/creat/fopen/freopen/fdopen (and
#      their 64-bit variants), socket/connect/bind/listen/accept/
#      getaddrinfo/gethostbyname/send*/recv*, fork/vfork/clone/exec*/
#      system/popen/posix_spawn*, dlopen/dlsym, and the C++ file streams
#      (basic_ifstream/basic_ofstream/basic_fstream/basic_filebuf).
#      (std::ostringstream, used by Boost.Math to format error texts, and
#      the iostream static initialiser are in-memory and allowed.)
# Exit status 0 when every check passes; each check prints one line.
set -uo pipefail
lib=${1:?usage: check_hardening.sh <libtubeheat.so>}
fail=0
ok() { echo "PASS  $*"; }
bad() { echo "FAIL  $*"; fail=1; }

[ -f "$lib" ] || { echo "FAIL  no such file: $lib"; exit 1; }
phdrs=$(readelf -lW "$lib") || { echo "FAIL  readelf -l failed"; exit 1; }
dyn=$(readelf -dW "$lib") || { echo "FAIL  readelf -d failed"; exit 1; }
undef=$(nm -D --undefined-only "$lib" | awk '{print $NF}' | sed 's/@.*//') ||
  { echo "FAIL  nm -D failed"; exit 1; }

# 1. full RELRO
if grep -q "GNU_RELRO" <<<"$phdrs"; then ok "GNU_RELRO segment present"; else bad "no GNU_RELRO segment (partial/no RELRO)"; fi
if grep -Eq '\(FLAGS\).*BIND_NOW|\(FLAGS_1\).*NOW' <<<"$dyn"; then
  ok "BIND_NOW set (full RELRO)"
else
  bad "BIND_NOW not set: lazy binding, GOT stays writable"
fi

# 2. no executable stack
stack=$(grep "GNU_STACK" <<<"$phdrs")
if [ -z "$stack" ]; then
  bad "no GNU_STACK header (the loader may assume an executable stack)"
elif awk '{for (i = 1; i <= NF; i++) if ($i ~ /^R?W?E$/ && $i ~ /E/) exit 1}' <<<"$stack"; then
  ok "stack not executable ($(awk '{print $(NF-1)}' <<<"$stack"))"
else
  bad "executable stack: $stack"
fi

# 3. no text relocations
if grep -q "TEXTREL" <<<"$dyn"; then bad "text relocations present"; else ok "no text relocations"; fi

# 4. stack protector / fortify
chk=$(grep -E '^__[a-z0-9_]+_chk$' <<<"$undef" | grep -v '^__stack_chk_fail$' | tr '\n' ' ')
if grep -qx "__stack_chk_fail" <<<"$undef"; then sp=1; echo "info  __stack_chk_fail imported (stack protector active)"; else sp=0; echo "info  __stack_chk_fail not imported"; fi
if [ -n "$chk" ]; then echo "info  fortified imports: $chk"; else echo "info  no fortified *_chk imports (no libc call with a size known at compile time)"; fi
if [ "$sp" = 1 ] || [ -n "$chk" ]; then ok "stack protector or fortify present"; else bad "neither __stack_chk_fail nor any *_chk import"; fi

# 5. no file / network / process functions
forbidden='^(open|open64|openat|openat64|creat|creat64|fopen|fopen64|freopen|freopen64|fdopen|opendir|socket|socketpair|connect|bind|listen|accept|accept4|getaddrinfo|gethostbyname|gethostbyname2|send|sendto|sendmsg|recv|recvfrom|recvmsg|fork|vfork|clone|clone3|execl|execle|execlp|execv|execve|execvp|execvpe|fexecve|system|popen|posix_spawn|posix_spawnp|dlopen|dlmopen|dlsym|ptrace)$'
found=$(grep -E "$forbidden" <<<"$undef" | tr '\n' ' ')
streams=$(grep -E 'basic_ifstream|basic_ofstream|basic_fstream|basic_filebuf' <<<"$undef" | tr '\n' ' ')
if [ -z "$found$streams" ]; then
  ok "no file/network/process imports ($(wc -l <<<"$undef") undefined symbols checked)"
else
  bad "forbidden imports: $found$streams"
fi

exit $fail
