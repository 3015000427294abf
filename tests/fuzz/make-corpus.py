#!/usr/bin/env python3
"""Writes the seed corpus tests/fuzz/corpus/<target>/ (run again after changing it; the files
are committed). Small valid and invalid inputs; the csv and run_log seeds start with two
option bytes ("00" = default options, see fuzz_input.h)."""
import os
import shutil
import sys

HERE = os.path.dirname(os.path.abspath(__file__))
ROOT = os.path.dirname(os.path.dirname(HERE))
OUT = os.path.join(HERE, "corpus")


def put(target, name, data, prefix=b""):
    d = os.path.join(OUT, target)
    os.makedirs(d, exist_ok=True)
    if isinstance(data, str):
        data = data.encode()
    with open(os.path.join(d, name), "wb") as f:
        f.write(prefix + data)


def head(path, lines):
    with open(os.path.join(ROOT, path), "rb") as f:
        return b"".join(f.readlines()[:lines])


CSV = {
    "plain": "T,P\n300,101325\n250,1000\n",
    "units": "T [degC],P [mTorr]\n-40,100\n-20,200\n",
    "semicolon-decimal-comma": "T [degC];P [bar]\n-40,5;1,2\n",
    "tab": "time [min]\tT [K]\tP [kPa]\n0\t300\t101.3\n1\t301\t101.2\n",
    "quoted": '"T [K]","P [Pa]","note"\n300,101325,"a ""quoted"", note"\n300,1,"two\nlines"\n',
    "bom-crlf": "\ufeffT,P\r\n300,101325\r\n",
    "empty": "",
    "header-only": "T,P\n",
    "short-row": "T,P\n300\n",
    "long-row": "T,P\n300,1,2\n",
    "non-numeric": "T,P\nhot,1\n",
    "nan-inf": "T,P\nnan,inf\n-inf,1e400\n",
    "negative": "T,P\n-5,0\n300,-1\n",
    "mixed-separators": "T;P,x\n1;2,3\n",
    "gauge": "time [s],T [degC],P [barg]\n0,20,1.5\n10,21,-1.2\n",
    "iso-time": "timestamp,T [degC],P [mTorr]\n2026-03-14T08:00:00Z,-45,75\n"
                "2026-03-14 08:00:30.5+01:00,-44,76\n2026-02-30T25:61:61Z,1,1\n",
    "time-backwards": "time,T,P\n10,300,1\n5,300,1\n",
    "unknown-unit": "T [furlong],P [Pa]\n1,2\n",
    "blank-lines": "\n\nT,P\n\n300,1\n\n",
    "unterminated-quote": 'T,P\n"300,1\n',
}


def csv_like(target):
    for name, text in CSV.items():
        put(target, name + ".csv", text, b"00")
    for opts in ("13", "21", "30", "47", "5?"):
        put(target, "options-" + opts + ".csv", CSV["units"], opts.encode())
    put(target, "small-run.csv", head("tests/core/run/data/small-run.csv", 10), b"00")
    for demo in ("freeze-drying-run.csv", "co2-drying-run.csv"):
        put(target, "demo-" + demo, head("resources/demo/" + demo, 12), b"00")
    for f in os.listdir(os.path.join(ROOT, "tests/core/csv/data")):
        with open(os.path.join(ROOT, "tests/core/csv/data", f), "rb") as src:
            put(target, "core-" + f, src.read(), b"04" if "decimal_comma" in f else b"00")


def substance():
    d = os.path.join(OUT, "substance")
    os.makedirs(d, exist_ok=True)
    src = [os.path.join(ROOT, "resources/substances")]
    src += [os.path.join(ROOT, "tests/core/io/data"), os.path.join(ROOT, "tests/core/io/data/broken")]
    for folder in src:
        for f in sorted(os.listdir(folder)):
            if f.endswith(".json"):
                shutil.copy(os.path.join(folder, f), os.path.join(d, os.path.basename(folder) + "-" + f))


def units():
    words = ["K", "kelvin", "degC", "°C", "C", "celsius", "degF", "°F", "degR", "R", "Pa", "kPa",
             "MPa", "GPa", "bar", "mbar", "µbar", "ubar", "microbar", "atm", "Torr", "mTorr",
             "mmHg", "psi", "psia", "psig", "barg", " Pa ", "PA", "", "°", "furlong", "\xff\xfe"]
    for i, w in enumerate(words):
        put("units", "unit-%02d" % i, w.encode("utf-8", "surrogateescape"))


SESSION = {
    "minimal": '{"format":"phasewright-session","version":1,"substances":[{"id":"water",'
               '"origin":"bundled:water.json"}],"units":{"T":"degC","P":"Pa"},"view":{"T_min_K":200,'
               '"T_max_K":400,"P_min_Pa":1,"P_max_Pa":1e7,"log_p":true,"show_1atm":true},"points":'
               '[{"label":"A","T_K":233.15,"P_Pa":10.0}]}',
    "recovery": '{"format":"phasewright-session","version":1,"substances":[],"units":{"T":"K",'
                '"P":"mTorr"},"view":{"T_min_K":1,"T_max_K":2,"P_min_Pa":1,"P_max_Pa":2,"log_p":false,'
                '"show_1atm":false},"points":[],"recovered_from":"/tmp/a.pwsession"}',
    "wrong-format": '{"format":"other","version":1}',
    "wrong-version": '{"format":"phasewright-session","version":99}',
    "bad-units": '{"format":"phasewright-session","version":1,"units":{"T":"furlong","P":"Pa"}}',
    "nan-point": '{"format":"phasewright-session","version":1,"points":[{"label":"A","T_K":"nan"}]}',
    "array": "[1,2,3]",
    "empty": "",
    "junk": "\x00\x01{{{\xff",
}


def session():
    for name, text in SESSION.items():
        put("session", name + ".pwsession", text.encode("utf-8", "surrogateescape"))


if __name__ == "__main__":
    if os.path.isdir(OUT):
        shutil.rmtree(OUT)
    csv_like("csv")
    csv_like("run_log")
    substance()
    units()
    session()
    for t in sorted(os.listdir(OUT)):
        print(t, len(os.listdir(os.path.join(OUT, t))), file=sys.stderr)
