#!/usr/bin/env python3
"""Bytes of every demo board page on a running Wayledger (loopback only): plain and gzip, and the
advice lines that the page leaves out (fetched when their fold is opened).

    java -jar target/wayledger-0.1.0-SNAPSHOT.jar --spring.profiles.active=demo --server.port=8417 \
         --server.address=127.0.0.1 '--spring.datasource.url=jdbc:h2:file:/tmp/wl-sizes/db;MODE=PostgreSQL;DATABASE_TO_LOWER=TRUE;DEFAULT_NULL_ORDERING=HIGH'
    python3 src/benchmark/page_sizes.py --port 8417 [--save DIR]

Signs in as the demo user through the sign-in form, reads the sites and boards through the API
(HTTP Basic, a handful of calls), then fetches each board page twice (plain, gzip).
"""
import argparse, base64, http.cookiejar, json, os, re, urllib.error, urllib.parse, urllib.request

p = argparse.ArgumentParser()
p.add_argument("--port", type=int, default=8417)
p.add_argument("--save", help="folder to write each board page to (board-<id>.html)")
args = p.parse_args()
base = f"http://127.0.0.1:{args.port}"
opener = urllib.request.build_opener(urllib.request.HTTPCookieProcessor(http.cookiejar.CookieJar()))
page = opener.open(base + "/login").read().decode()
csrf = re.search(r'name="_csrf" value="([^"]*)"', page).group(1)
opener.open(base + "/login", urllib.parse.urlencode(
    {"username": "demo", "password": "wayledger-demo", "_csrf": csrf}).encode()).read()
auth = {"Authorization": "Basic " + base64.b64encode(b"demo:wayledger-demo").decode()}


def api(path):
    return json.loads(urllib.request.urlopen(urllib.request.Request(base + path, headers=auth)).read())


def fetch(path, gzip=False):
    headers = {"Accept-Encoding": "gzip"} if gzip else {}
    try:
        return opener.open(urllib.request.Request(base + path, headers=headers)).read()
    except urllib.error.HTTPError:
        return b""  # a build without the advice fetch


sites = api("/api/sites")
sites = sites.get("content", sites) if isinstance(sites, dict) else sites
total = 0
print(f"{'site':28} {'board':10} {'page bytes':>10} {'gzip':>6} {'advice fetched':>14}")
for site in sites:
    for board in api(f"/api/sites/{site['id']}/boards"):
        path = f"/boards/{board['id']}"
        body = fetch(path)
        total += len(body)
        if args.save:
            os.makedirs(args.save, exist_ok=True)
            with open(os.path.join(args.save, f"board-{board['id']}.html"), "wb") as out:
                out.write(body)
        print(f"{site['name'][:28]:28} {board['reference']:10} {len(body):10} "
              f"{len(fetch(path, True)):6} {len(fetch(path + '/findings/advice')):14}")
print(f"every board page: {total} bytes")
