#!/usr/bin/env python3
"""Side-by-side benchmark of Wayledger and a bare Spring Boot app (src/benchmark/bare).

Builds both jars, starts both on loopback, signs in to both, creates a Wayledger API token through the
account page, then runs `wrk` against pairs of endpoints, interleaved (Wayledger, bare, Wayledger, ...)
so that the machine's changing load hits both alike. Writes a Markdown table of medians and ratios, with
the load average beside each figure, to target/benchmark/results.md (and prints it).

    python3 src/benchmark/run.py                # defaults: 3 rounds of 10 s per endpoint
    python3 src/benchmark/run.py --rounds 5 --seconds 20 --skip-build
    python3 src/benchmark/run.py --only startup --starts 5   # start-up and idle memory only, interleaved

Only loopback, bounded in time (rounds x pairs x 2 x seconds). Requires wrk and curl on PATH and Java 17.
Nothing here runs inside `./mvnw verify`.
"""
import argparse
import base64
import http.cookiejar
import json
import os
import re
import shutil
import statistics
import subprocess
import sys
import tempfile
import time
import urllib.parse
import urllib.request

ROOT = os.path.abspath(os.path.join(os.path.dirname(__file__), "..", ".."))
BARE = os.path.join(ROOT, "src", "benchmark", "bare")
OUT = os.path.join(ROOT, "target", "benchmark")


def load():
    return os.getloadavg()[0]


def sh(cmd, **kw):
    print("+", " ".join(cmd), flush=True)
    subprocess.run(cmd, check=True, **kw)


def build(offline):
    mvn = [os.path.join(ROOT, "mvnw"), "-B", "-q"] + (["-o"] if offline else [])
    sh(mvn + ["package", "-DskipTests", "-Djacoco.skip=true", "-Dspotless.check.skip=true"], cwd=ROOT)
    sh(mvn + ["-f", os.path.join(BARE, "pom.xml"), "package", "-DskipTests"], cwd=ROOT)
    jar = [f for f in os.listdir(os.path.join(ROOT, "target")) if f.startswith("wayledger") and f.endswith(".jar")]
    return os.path.join(ROOT, "target", sorted(jar)[0]), os.path.join(BARE, "target", "bare.jar")


class App:
    def __init__(self, name, jar, port, args, ready_path):
        self.name, self.jar, self.port, self.args, self.ready_path = name, jar, port, args, ready_path
        self.proc = None
        self.jar_cookies = http.cookiejar.CookieJar()
        self.opener = urllib.request.build_opener(
            urllib.request.HTTPCookieProcessor(self.jar_cookies), NoRedirect())

    def url(self, path):
        return f"http://127.0.0.1:{self.port}{path}"

    def start(self, log_dir, heap, jvm=()):
        log = open(os.path.join(log_dir, f"{self.name}.log"), "w")
        launch = getattr(self, "launch", None) or ["-jar", self.jar]
        try:  # another program on this port would answer for us and make the timing meaningless
            urllib.request.urlopen(self.url("/"), timeout=2)
            raise SystemExit(f"port {self.port} is already in use; choose another with --port")
        except urllib.error.HTTPError:
            raise SystemExit(f"port {self.port} is already in use; choose another with --port")
        except (urllib.error.URLError, OSError):
            pass
        cmd = ["java", f"-Xmx{heap}", *jvm, *launch, f"--server.port={self.port}",
               "--server.address=127.0.0.1"] + self.args
        started = time.monotonic()
        self.proc = subprocess.Popen(cmd, stdout=log, stderr=subprocess.STDOUT, cwd=log_dir)
        while time.monotonic() - started < 900:
            try:
                with urllib.request.urlopen(self.url(self.ready_path), timeout=2) as r:
                    if r.status == 200:
                        self.first_page_seconds = time.monotonic() - started
                        return self.first_page_seconds
            except Exception:
                pass
            if self.proc.poll() is not None:
                raise SystemExit(f"{self.name} exited; see {log.name}")
            time.sleep(0.1)
        raise SystemExit(f"{self.name} did not answer {self.ready_path} within 900 s")

    def rss_mb(self):
        with open(f"/proc/{self.proc.pid}/status") as f:
            for line in f:
                if line.startswith("VmRSS:"):
                    return int(line.split()[1]) / 1024
        return float("nan")

    def stop(self):
        if self.proc and self.proc.poll() is None:
            self.proc.terminate()
            try:
                self.proc.wait(30)
            except subprocess.TimeoutExpired:
                self.proc.kill()

    def get(self, path, headers=None):
        req = urllib.request.Request(self.url(path), headers=headers or {})
        try:
            with self.opener.open(req, timeout=60) as r:
                return r.status, r.read().decode("utf-8", "replace")
        except urllib.error.HTTPError as e:
            return e.code, e.read().decode("utf-8", "replace")

    def post(self, path, fields):
        data = urllib.parse.urlencode(fields).encode()
        req = urllib.request.Request(self.url(path), data=data)
        try:
            with self.opener.open(req, timeout=60) as r:
                return r.status, r.read().decode("utf-8", "replace")
        except urllib.error.HTTPError as e:
            return e.code, e.read().decode("utf-8", "replace")

    def csrf(self, path):
        status, body = self.get(path)
        m = re.search(r'name="_csrf"[^>]*value="([^"]+)"', body) or re.search(r'value="([^"]+)"[^>]*name="_csrf"', body)
        return m.group(1) if m else None

    def sign_in(self, user, password):
        deadline = time.monotonic() + 120
        while time.monotonic() < deadline:  # the demo account may still be on its way
            token = self.csrf("/login")
            fields = {"username": user, "password": password}
            if token:
                fields["_csrf"] = token
            status, _ = self.post("/login", fields)
            if status in (302, 303) and self.get("/login")[0] == 200:
                loc_ok = any(c.name in ("SESSION", "JSESSIONID") for c in self.jar_cookies)
                if loc_ok and self.authorised():
                    return
            time.sleep(0.5)
        raise SystemExit(f"could not sign in to {self.name}")

    def authorised(self):
        return self.get(self.ready_after_sign_in)[0] == 200

    def cookie_header(self):
        return "; ".join(f"{c.name}={c.value}" for c in self.jar_cookies)


class NoRedirect(urllib.request.HTTPRedirectHandler):
    def redirect_request(self, *a, **k):
        return None


def prepare_cds(jar, name, args, jvm=()):
    """Class-data sharing for one app: extracts its jar (Spring Boot's tools jar mode; classes cannot be
    archived from inside nested jars), then records the classes a start loads in a training run that
    stops right after the context refresh, on a throwaway in-memory database. Returns the launch arguments."""
    dest = os.path.join(OUT, f"cds-{name}")
    shutil.rmtree(dest, ignore_errors=True)
    sh(["java", "-Djarmode=tools", "-jar", jar, "extract", "--destination", dest])
    app_jar = os.path.join(dest, os.path.basename(jar))
    archive = os.path.join(dest, f"{name}.jsa")
    sh(["java", *jvm, f"-XX:ArchiveClassesAtExit={archive}", "-Dspring.context.exit=onRefresh", "-jar", app_jar,
        "--server.port=0", "--server.address=127.0.0.1"] + args, stdout=subprocess.DEVNULL)
    return [f"-XX:SharedArchiveFile={archive}", "-jar", app_jar]


def cpu_seconds(pid):
    """User + system CPU time the process has used so far (Linux /proc), in seconds."""
    with open(f"/proc/{pid}/stat") as f:
        fields = f.read().rsplit(")", 1)[1].split()
    return (int(fields[11]) + int(fields[12])) / os.sysconf("SC_CLK_TCK")


def wrk(url, headers, seconds, connections, threads, pid=None):
    cmd = ["wrk", f"-t{threads}", f"-c{connections}", f"-d{seconds}s", "--latency", "--timeout", "10s"]
    for h in headers:
        cmd += ["-H", h]
    cmd.append(url)
    before = load()
    cpu_before = cpu_seconds(pid) if pid else 0
    out = subprocess.run(cmd, capture_output=True, text=True, check=True).stdout
    cpu_used = cpu_seconds(pid) - cpu_before if pid else float("nan")
    requests = int(re.search(r"(\d+) requests in", out).group(1))
    rps = float(re.search(r"Requests/sec:\s+([\d.]+)", out).group(1))
    p50 = re.search(r"50%\s+([\d.]+)(us|ms|s)", out)
    p50_ms = float(p50.group(1)) * {"us": 0.001, "ms": 1, "s": 1000}[p50.group(2)] if p50 else float("nan")
    non2xx = re.search(r"Non-2xx or 3xx responses:\s+(\d+)", out)
    if non2xx:
        print(f"  warning: {non2xx.group(1)} non-2xx answers from {url}", flush=True)
    return {"rps": rps, "p50_ms": p50_ms, "load": (before + load()) / 2,
            "non2xx": int(non2xx.group(1)) if non2xx else 0,
            # server CPU per answered request: far steadier than req/s on a machine shared with other work
            "cpu_ms": 1000 * cpu_used / requests if requests else float("nan")}


def timed_get(app, path, headers, times):
    seconds = []
    for _ in range(times):
        started = time.monotonic()
        status, body = app.get(path, headers)
        seconds.append(time.monotonic() - started)
        if status != 200:
            raise SystemExit(f"{path}: HTTP {status}")
    return seconds


def jcmd(pid, *command):
    return subprocess.run(["jcmd", str(pid), *command], capture_output=True, text=True, timeout=120).stdout


def idle_memory(app, nmt):
    """Idle memory of a started app: RSS as it stands, then a forced full GC and what is left — heap used and
    committed, metaspace, loaded classes, threads and (with NMT on) the JVM's own account by category."""
    pid = app.proc.pid
    out = {"rss_mb": app.rss_mb()}
    jcmd(pid, "GC.run")
    time.sleep(2)
    out["rss_after_gc_mb"] = app.rss_mb()
    with open(os.path.join(OUT, f"histogram-{app.name}.txt"), "w") as f:  # the last start's live objects by class
        f.write("\n".join(jcmd(pid, "GC.class_histogram").splitlines()[:60]))
    info = jcmd(pid, "GC.heap_info")
    heap = [(int(t), int(u)) for t, u in re.findall(r"total (\d+)K, used (\d+)K", info.split("Metaspace")[0])]
    out["heap_committed_mb"] = sum(t for t, _ in heap) / 1024
    out["heap_used_mb"] = sum(u for _, u in heap) / 1024
    meta = re.search(r"Metaspace\s+used (\d+)K, committed (\d+)K", info)
    out["metaspace_used_mb"] = int(meta.group(1)) / 1024 if meta else float("nan")
    counters = dict(re.findall(r"^([\w.]+)=(\S+)$", jcmd(pid, "PerfCounter.print"), re.M))
    out["classes"] = int(counters.get("java.cls.loadedClasses", 0)) - int(counters.get("java.cls.unloadedClasses", 0))
    out["shared_classes"] = int(counters.get("sun.cls.sharedLoadedClasses", 0))
    with open(f"/proc/{pid}/status") as f:
        out["threads"] = int(next(line.split()[1] for line in f if line.startswith("Threads:")))
    if nmt:
        summary = jcmd(pid, "VM.native_memory", "summary", "scale=KB")
        total = re.search(r"Total: reserved=\d+KB, committed=(\d+)KB", summary)
        out["nmt_total_mb"] = int(total.group(1)) / 1024 if total else float("nan")
        out["nmt"] = {name.strip(): int(committed) / 1024 for name, committed in
                      re.findall(r"-\s+([A-Za-z][\w ]*?) \(reserved=\d+KB, committed=(\d+)KB\)", summary)}
    return out


def startup_only(args, wl_jar, bare_jar):
    """Starts each app args.starts times, interleaved (the order rotates every round), each time on a fresh
    database, one app at a time; times its first page (Wayledger's must already find the demo site), then reads
    its idle memory. --variant adds Wayledger started with other arguments (or another jar) to the same rounds.
    Writes target/benchmark/startup.md."""
    jvm = list(args.jvm) + (["-XX:NativeMemoryTracking=summary"] if args.nmt else [])
    demo = ["--spring.profiles.active=demo"]
    apps = {"bare": (bare_jar, []), "wayledger": (wl_jar, [])}
    for v in args.variant:  # name=jar-or-nothing|arg arg ...
        name, _, rest = v.partition("=")
        jar, _, extra = rest.partition("|") if "|" in rest else ("", "", rest)
        apps[name] = (jar or wl_jar, extra.split())
    launches = {}
    if args.cds:
        for name, (jar, extra) in apps.items():
            launches[name] = prepare_cds(jar, name, [] if name == "bare" else demo + extra + [
                "--spring.datasource.url=jdbc:h2:mem:cds;MODE=PostgreSQL;DATABASE_TO_LOWER=TRUE;DEFAULT_NULL_ORDERING=HIGH"],
                jvm)
    runs = {name: [] for name in apps}
    names = list(apps)
    for i in range(args.starts):
        order = names[i % len(names):] + names[:i % len(names)]
        for name in (order if i % 2 == 0 else order[::-1]):
            work = tempfile.mkdtemp(prefix="wayledger-start-")
            jar, extra = apps[name]
            if name == "bare":
                app = App(name, jar, args.port + 1, [], "/login")
            else:
                app = App(name, jar, args.port, demo + extra + [
                    f"--spring.datasource.url=jdbc:h2:file:{work}/db;MODE=PostgreSQL;DATABASE_TO_LOWER=TRUE;DEFAULT_NULL_ORDERING=HIGH"],
                    "/login")
            if name in launches:
                app.launch = launches[name]
            load_before = load()
            try:
                secs = app.start(work, args.heap, jvm)
                if name != "bare":
                    # the first page a user opens must already show the demo sites
                    status, body = app.get("/api/sites", {"Authorization": basic("demo", "wayledger-demo")})
                    if status != 200 or "Tallow Lane Works" not in body:
                        raise SystemExit(f"demo site not there when the first page answered (HTTP {status})")
                time.sleep(10)
                mem = idle_memory(app, args.nmt)
            finally:
                app.stop()
                shutil.rmtree(work, ignore_errors=True)
            mem.update(seconds=secs, load=load_before)
            runs[name].append(mem)
            print(f"start {i + 1} {name}: first page after {secs:.1f} s (load {load_before:.1f}), RSS {mem['rss_mb']:.0f} MB,"
                  f" after GC {mem['rss_after_gc_mb']:.0f} MB, heap used {mem['heap_used_mb']:.0f} MB,"
                  f" metaspace {mem['metaspace_used_mb']:.0f} MB, {mem['classes']} classes", flush=True)
    write_startup_report(args, jvm, apps, runs)


def write_startup_report(args, jvm, apps, runs):
    b = runs["bare"]
    mine = [n for n in runs if n != "bare"]
    flags = " ".join([f"-Xmx{args.heap}", *jvm]) + (" + class-data sharing archive (each app its own)" if args.cds else "")
    lines = [f"# Start-up run {time.strftime('%Y-%m-%d %H:%M UTC', time.gmtime())}", "",
             f"`python3 src/benchmark/run.py --only startup --starts {args.starts}{' --cds' if args.cds else ''}"
             f"{' --nmt' if args.nmt else ''}{''.join(' --jvm=' + j for j in args.jvm)}"
             f"{''.join(' --variant ' + repr(v) for v in args.variant)}` — JVM flags for every app: `{flags}`;"
             " interleaved, one app at a time, each start on a fresh database. Medians; ratio = Wayledger ÷ bare.", ""]
    for n in mine:
        if apps[n][1] or apps[n][0] != apps["wayledger"][0]:
            lines.append(f"- {n}: `{os.path.basename(apps[n][0])}` {' '.join(apps[n][1])}")
    lines += ["", "| start-up | " + " | ".join(f"{n} | ratio" for n in mine) + " | bare |",
              "|---|" + "---|---|" * len(mine) + "---|"]
    rows = [("time to first page (s)", "seconds", 1), ("idle RSS 10 s after the first page (MB)", "rss_mb", 0),
            ("RSS after a forced full GC (MB)", "rss_after_gc_mb", 0), ("heap used after GC (MB)", "heap_used_mb", 1),
            ("heap committed after GC (MB)", "heap_committed_mb", 0), ("metaspace used (MB)", "metaspace_used_mb", 1),
            ("loaded classes", "classes", 0), ("threads", "threads", 0)]
    if args.nmt:
        rows.append(("NMT committed total (MB)", "nmt_total_mb", 0))
    for label, key, digits in rows:
        mb = median(b, key)
        cells = []
        for n in mine:
            mw = median(runs[n], key)
            cells.append(f"{mw:.{digits}f} | {mw / mb if mb else float('nan'):.2f}")
        lines.append(f"| {label} | " + " | ".join(cells) + f" | {mb:.{digits}f} |")
    if args.nmt:
        cats = sorted(set().union(*(x["nmt"] for xs in runs.values() for x in xs)),
                      key=lambda c: -statistics.median(x["nmt"].get(c, 0) for x in runs[mine[0]]))
        lines += ["", "| NMT committed by category (MB, median) | " + " | ".join(mine) + " | bare |",
                  "|---|" + "---|" * (len(mine) + 1)]
        for c in cats:
            values = [statistics.median(x["nmt"].get(c, 0) for x in runs[n]) for n in mine + ["bare"]]
            if max(values) >= 1:
                lines.append(f"| {c} | " + " | ".join(f"{v:.0f}" for v in values) + " |")
    lines += ["", "| start | app | first page (s) | load | RSS (MB) | RSS after GC | heap used | metaspace | classes |",
              "|---|---|---|---|---|---|---|---|---|"]
    for name, xs in runs.items():
        for i, x in enumerate(xs):
            lines.append(f"| {i + 1} | {name} | {x['seconds']:.1f} | {x['load']:.1f} | {x['rss_mb']:.0f} | "
                         f"{x['rss_after_gc_mb']:.0f} | {x['heap_used_mb']:.1f} | {x['metaspace_used_mb']:.1f} | {x['classes']} |")
    loads = [x["load"] for xs in runs.values() for x in xs]
    lines += ["", f"Load (1-minute average) just before the starts: {min(loads):.1f}–{max(loads):.1f}."]
    text = "\n".join(lines) + "\n"
    with open(os.path.join(OUT, "startup.md"), "w") as f:
        f.write(text)
    print(text)


def main():
    global OUT
    p = argparse.ArgumentParser(description=__doc__, formatter_class=argparse.RawDescriptionHelpFormatter)
    p.add_argument("--rounds", type=int, default=3)
    p.add_argument("--seconds", type=int, default=10)
    p.add_argument("--connections", type=int, default=16)
    p.add_argument("--threads", type=int, default=2)
    p.add_argument("--port", type=int, default=8112, help="Wayledger; the bare app uses port+1")
    p.add_argument("--heap", default="512m")
    p.add_argument("--skip-build", action="store_true")
    p.add_argument("--online", action="store_true", help="let Maven download (default offline)")
    p.add_argument("--jfr", action="store_true",
                   help="record Wayledger with Java Flight Recorder and summarise where its CPU samples fall")
    p.add_argument("--cds", action="store_true",
                   help="start Wayledger from its extracted jar with a class-data sharing archive (training run"
                        " first); the bare app still starts as a plain jar")
    p.add_argument("--only", choices=("all", "startup", "pages"), default="all",
                   help="startup: only time to first page and idle memory, --starts times each, interleaved;"
                        " pages: only the board schedule and full board page against the bare table (no site"
                        " overview, API, export or transfer sizes); start-up is still timed")
    p.add_argument("--starts", type=int, default=3, help="with --only startup: starts of each app")
    p.add_argument("--nmt", action="store_true",
                   help="with --only startup: native memory tracking on in both apps, its summary in the report")
    p.add_argument("--jvm", action="append", default=[],
                   help="with --only startup: an extra JVM flag for both apps (repeatable, e.g. --jvm=-XX:+UseSerialGC)")
    p.add_argument("--variant", action="append", default=[],
                   help="with --only startup: another Wayledger start in the same rounds, NAME=ARGS or NAME=JAR|ARGS"
                        " (e.g. 'deferred=--spring.data.jpa.repositories.bootstrap-mode=deferred')")
    p.add_argument("--board", help="reference of the demo board to measure (default: the one with most circuits)")
    p.add_argument("--jar", help="measure this Wayledger jar instead of building one (e.g. a copy of an earlier"
                        " build, to compare two builds with the same command); the bare app is still built unless"
                        " --skip-build")
    p.add_argument("--warmup", type=int,
                   help="seconds of wrk per endpoint before the timed rounds (default half of --seconds); the JIT"
                        " needs a few hundred requests of each page, which a loaded machine serves slowly")
    p.add_argument("--out", default=OUT, help="where results.md and the JFR recording go (default target/benchmark);"
                   " give two runs at once different folders and ports")
    args = p.parse_args()
    OUT = os.path.abspath(args.out)
    for tool in ("wrk", "java"):
        if not shutil.which(tool):
            raise SystemExit(f"{tool} is not on PATH")
    os.makedirs(OUT, exist_ok=True)
    if args.skip_build:
        jar = sorted(f for f in os.listdir(os.path.join(ROOT, "target")) if f.startswith("wayledger") and f.endswith(".jar"))[0]
        wl_jar, bare_jar = os.path.join(ROOT, "target", jar), os.path.join(BARE, "target", "bare.jar")
    elif args.jar:
        mvn = [os.path.join(ROOT, "mvnw"), "-B", "-q"] + ([] if args.online else ["-o"])
        sh(mvn + ["-f", os.path.join(BARE, "pom.xml"), "package", "-DskipTests"], cwd=ROOT)
        wl_jar, bare_jar = None, os.path.join(BARE, "target", "bare.jar")
    else:
        wl_jar, bare_jar = build(not args.online)
    if args.jar:
        wl_jar = os.path.abspath(args.jar)
    if args.only == "startup":
        startup_only(args, wl_jar, bare_jar)
        return

    work = tempfile.mkdtemp(prefix="wayledger-bench-")
    jfr_file = os.path.join(OUT, "wayledger.jfr")
    wl = App("wayledger", wl_jar, args.port,
             ["--spring.profiles.active=demo",
              f"--spring.datasource.url=jdbc:h2:file:{work}/db;MODE=PostgreSQL;DATABASE_TO_LOWER=TRUE;DEFAULT_NULL_ORDERING=HIGH"],
             "/login")
    wl.ready_after_sign_in = "/sites"
    bare = App("bare", bare_jar, args.port + 1, [], "/login")
    bare.ready_after_sign_in = "/table"
    if args.cds:
        wl.launch = prepare_cds(wl_jar, "wayledger", [
            "--spring.profiles.active=demo",
            "--spring.datasource.url=jdbc:h2:mem:cds;MODE=PostgreSQL;DATABASE_TO_LOWER=TRUE;DEFAULT_NULL_ORDERING=HIGH"])
    rows = []
    try:
        # Start-up: one after the other so that they do not compete; time to the first page, then idle RSS.
        start = {}
        for app in (bare, wl):
            load_before = load()
            # stacks of 256 frames: a template's render stack is deeper than JFR's default 64, and a cut stack
            # loses the frames that say which request (and bucket) it belongs to
            jvm = (["-XX:FlightRecorderOptions=stackdepth=256",
                    f"-XX:StartFlightRecording=filename={jfr_file},settings=profile,dumponexit=true"]
                   if args.jfr and app is wl else [])
            secs = app.start(work, args.heap, jvm)
            time.sleep(10)
            start[app.name] = (secs, app.rss_mb(), load_before)
            print(f"{app.name}: first page after {secs:.1f} s, idle RSS {start[app.name][1]:.0f} MB", flush=True)

        wl.sign_in("demo", "wayledger-demo")
        bare.sign_in("bench", "bench-password")
        sites = json.loads(wl.get("/api/sites", {"Authorization": basic("demo", "wayledger-demo")})[1])
        site_id = sites[0]["id"]
        boards = json.loads(wl.get(f"/api/sites/{site_id}/boards", {"Authorization": basic("demo", "wayledger-demo")})[1])
        counts = {}
        for b in boards:
            d = json.loads(wl.get(f"/api/boards/{b['id']}/demand", {"Authorization": basic("demo", "wayledger-demo")})[1])
            inner = d.get("result", d) if isinstance(d, dict) else {}
            counts[b["id"]] = (b.get("reference"), len(inner.get("circuits", [])))
        board_id = (next(i for i, (ref, _) in counts.items() if ref == args.board) if args.board
                    else max(counts, key=lambda i: counts[i][1]))
        print(f"board {counts[board_id][0]} (id {board_id}), {counts[board_id][1]} circuits", flush=True)

        token = create_token(wl)
        cookie_wl, cookie_bare = f"Cookie: {wl.cookie_header()}", f"Cookie: {bare.cookie_header()}"
        pairs = [
            ("board schedule (htmx fragment) vs bare 100-row table",
             (wl.url(f"/boards/{board_id}/schedule"), [cookie_wl]), (bare.url("/table"), [cookie_bare])),
            ("full board page vs bare 100-row table",
             (wl.url(f"/boards/{board_id}"), [cookie_wl]), (bare.url("/table"), [cookie_bare])),
            ("site overview vs bare 100-row table",
             (wl.url(f"/sites/{site_id}"), [cookie_wl]), (bare.url("/table"), [cookie_bare])),
            ("GET /api/boards/{id}/demand with a token vs bare JSON without sign-in",
             (wl.url(f"/api/boards/{board_id}/demand"), [f"Authorization: Bearer {token}"]),
             (bare.url("/open/rows"), [])),
            ("GET /api/boards/{id}/demand with HTTP Basic vs bare JSON with HTTP Basic",
             (wl.url(f"/api/boards/{board_id}/demand"), [f"Authorization: {basic('demo', 'wayledger-demo')}"]),
             (bare.url("/api/rows"), [f"Authorization: {basic('bench', 'bench-password')}"])),
        ]
        if args.only == "pages":
            pairs = pairs[:2]
        for app, (url, headers) in [(wl, p[1]) for p in pairs] + [(bare, p[2]) for p in pairs]:
            wrk(url, headers, args.warmup or max(2, args.seconds // 2), args.connections, args.threads)  # warm-up
        results = {label: ([], []) for label, _, _ in pairs}
        for r in range(args.rounds):
            for label, mine, theirs in pairs:
                order = [(0, mine), (1, theirs)] if r % 2 == 0 else [(1, theirs), (0, mine)]
                for side, (url, headers) in order:
                    pid = (wl if side == 0 else bare).proc.pid
                    res = wrk(url, headers, args.seconds, args.connections, args.threads, pid)
                    results[label][side].append(res)
                    print(f"  round {r + 1} {'wayledger' if side == 0 else 'bare'} ({label}): "
                          f"{res['rps']:.0f} req/s p50 {res['p50_ms']:.1f} ms, server CPU {res['cpu_ms']:.2f} ms/request,"
                          f" load {res['load']:.1f}", flush=True)

        export = (timed_get(wl, f"/sites/{site_id}/export.xlsx", {"Cookie": wl.cookie_header()}, 5)
                  if args.only == "all" else None)
        sizes = transfer_sizes(wl, board_id) if args.only == "all" else {}
        write_report(args, start, counts[board_id], results, export, sizes)
    finally:
        for app in (wl, bare):
            app.stop()
        shutil.rmtree(work, ignore_errors=True)
    if args.jfr and os.path.exists(jfr_file):
        summarise_jfr(jfr_file)


# Where a CPU sample falls: the first of these buckets whose package appears anywhere on its stack.
JFR_BUCKETS = [
    ("link rewriting (ResourceUrlProvider and resolvers)",
     ("org.springframework.web.servlet.resource.ResourceUrlProvider",
      "org.springframework.web.servlet.resource.ResourceUrlEncodingFilter$ResourceUrlEncodingResponseWrapper",
      "org.springframework.web.servlet.resource.LiteWebJarsResourceResolver",
      "org.springframework.web.servlet.resource.PathResourceResolver",
      "org.springframework.web.servlet.resource.CachingResourceResolver",
      "org.springframework.web.servlet.resource.VersionResourceResolver")),
    ("message look-up", "org.springframework.context.support.AbstractMessageSource"),
    ("security expressions in templates", "org.thymeleaf.extras.springsecurity"),
    ("SpEL evaluation", "org.springframework.expression."),
    ("site analysis: engines", "com.wayledger.engine."),
    ("site analysis: loading (JPA/JDBC)", "org.hibernate."),
    ("database (H2)", "org.h2."),
    ("password hashing (bcrypt)", "org.springframework.security.crypto.bcrypt."),
    ("JSON writing", "tools.jackson."),
    ("template engine (Thymeleaf)", "org.thymeleaf."),
    ("compression", "java.util.zip."),
    ("Wayledger code", "com.wayledger."),
    ("Spring Security filters", "org.springframework.security."),
    ("Tomcat", "org.apache."),
]


def summarise_jfr(path):
    """Counts request-thread CPU samples per bucket (first bucket found anywhere on the stack)."""
    out = subprocess.run(["jfr", "print", "--events", "jdk.ExecutionSample", "--stack-depth", "256", path],
                         capture_output=True, text=True).stdout
    counts, total = {}, 0
    for event in out.split("jdk.ExecutionSample")[1:]:
        frames = re.findall(r"^\s+([\w.$<>]+)\(", event, re.M)
        if not any(f.startswith(("org.apache.catalina", "org.apache.tomcat", "org.springframework.web"))
                   for f in frames):
            continue  # not a request thread (start-up, JIT, GC helpers)
        total += 1
        bucket = next((name for name, prefix in JFR_BUCKETS
                       if any(f.startswith(prefix if isinstance(prefix, tuple) else (prefix,)) for f in frames)),
                      "other")
        counts[bucket] = counts.get(bucket, 0) + 1
    lines = ["", f"JFR CPU samples on request threads: {total}", "", "| where (first bucket of the list in run.py found on the stack) | share |",
             "|---|---|"]
    for name, n in sorted(counts.items(), key=lambda kv: -kv[1]):
        lines.append(f"| {name} | {100 * n / total:.0f} % |")
    text = "\n".join(lines) + "\n"
    with open(os.path.join(OUT, "results.md"), "a") as f:
        f.write(text)
    print(text)


def basic(user, password):
    return "Basic " + base64.b64encode(f"{user}:{password}".encode()).decode()


def create_token(wl):
    csrf = wl.csrf("/account")
    status, body = wl.post("/account/tokens", {"_csrf": csrf, "name": "benchmark", "scope": "READ"})
    m = re.search(r"wlt_[A-Za-z0-9_-]{43}", body)
    if status != 200 or not m:
        raise SystemExit(f"could not create an API token (HTTP {status})")
    return m.group(0)


def transfer_sizes(wl, board_id):
    """Bytes on the wire for one board page view, plain and gzip, and the static assets' cache header."""
    def fetch(path, gzip):
        headers = {"Cookie": wl.cookie_header()}
        if gzip:
            headers["Accept-Encoding"] = "gzip"
        req = urllib.request.Request(wl.url(path), headers=headers)
        with wl.opener.open(req, timeout=60) as r:
            return len(r.read()), r.headers.get("Content-Encoding"), r.headers.get("Cache-Control")
    status, page = wl.get(f"/boards/{board_id}", {"Cookie": wl.cookie_header()})
    assets = re.findall(r'(?:href|src)="(/(?:css|webjars|favicon)[^"]+)"', page)
    out = {"page": (fetch(f"/boards/{board_id}", False)[0], fetch(f"/boards/{board_id}", True)[0])}
    for a in sorted(set(assets)):
        plain, gz = fetch(a, False), fetch(a, True)
        out[a] = (plain[0], gz[0], gz[2])
    return out


def median(xs, key):
    return statistics.median(x[key] for x in xs)


def write_report(args, start, board, results, export, sizes):
    lines = [f"# Benchmark run {time.strftime('%Y-%m-%d %H:%M UTC', time.gmtime())}", "",
             f"`python3 src/benchmark/run.py --rounds {args.rounds} --seconds {args.seconds}{' --cds' if args.cds else ''}"
             f"{' --only pages' if args.only == 'pages' else ''}{f' --warmup {args.warmup}' if args.warmup else ''}{' --jar ' + args.jar if args.jar else ''}` — wrk -t{args.threads} "
             f"-c{args.connections}, {args.rounds} interleaved rounds of {args.seconds} s, heap {args.heap}; "
             f"board {board[0]} ({board[1]} circuits). Medians; load = 1-minute load average during the runs.", "",
             "Throughput ratio = Wayledger req/s ÷ bare req/s (higher is better, goal ≥ the issue's figure); CPU ratio ="
             " bare CPU per request ÷ Wayledger CPU per request, the same comparison measured as server CPU time"
             " (/proc), which other work on the machine disturbs far less.", "",
             "| what | Wayledger req/s (p50) | bare req/s (p50) | throughput ratio | Wayledger CPU ms/req | bare CPU ms/req | CPU ratio | load (min–max) |",
             "|---|---|---|---|---|---|---|---|"]
    for label, (mine, theirs) in results.items():
        loads = [x["load"] for x in mine + theirs]
        rps_ratio = median(mine, 'rps') / median(theirs, 'rps') if median(theirs, 'rps') else float("nan")
        cpu_ratio = median(theirs, 'cpu_ms') / median(mine, 'cpu_ms') if median(mine, 'cpu_ms') else float("nan")
        lines.append(f"| {label} | {median(mine, 'rps'):.0f} ({median(mine, 'p50_ms'):.1f} ms) | "
                     f"{median(theirs, 'rps'):.0f} ({median(theirs, 'p50_ms'):.1f} ms) | {rps_ratio:.2f} | "
                     f"{median(mine, 'cpu_ms'):.2f} | {median(theirs, 'cpu_ms'):.2f} | {cpu_ratio:.2f} | "
                     f"{min(loads):.1f}–{max(loads):.1f} |")
    w, b = start["wayledger"], start["bare"]
    lines += ["", *(["Wayledger started from its extracted jar with a class-data sharing archive (`--cds`, training run"
                     " before the timing); the bare app as a plain jar.", ""] if args.cds else []),
              "| start-up | Wayledger | bare | ratio |", "|---|---|---|---|",
              f"| time to first page (s) | {w[0]:.1f} (load {w[2]:.1f}) | {b[0]:.1f} (load {b[2]:.1f}) | {w[0] / b[0]:.2f} |",
              f"| idle RSS 10 s later (MB) | {w[1]:.0f} | {b[1]:.0f} | {w[1] / b[1]:.2f} |", ""]
    if export:
        lines += [
              f"Site export (XLSX, whole demo site), 5 single requests: median {statistics.median(export):.2f} s "
              f"(min {min(export):.2f}, max {max(export):.2f}), load {load():.1f}.", "",
              "| transfer | plain bytes | gzip bytes | Cache-Control |", "|---|---|---|---|"]
    for what, v in sizes.items():
        lines.append(f"| {what} | {v[0]} | {v[1]} | {v[2] if len(v) > 2 else '(page)'} |")
    text = "\n".join(lines) + "\n"
    with open(os.path.join(OUT, "results.md"), "w") as f:
        f.write(text)
    print(text)


if __name__ == "__main__":
    main()
