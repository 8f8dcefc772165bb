# Drive a program in a pseudo-terminal of a given size and time what it writes.
# Used by scripts/bench.mjs (node-pty is not a dependency; Python's pty module is
# in every CPython). Input: one JSON argument
#   {"argv": [...], "env": {...}, "cols": 80, "rows": 24, "steps": [{"send": "...", "digit": bool} or {"wait": seconds}],
#    "ready": "text that marks the first full frame", "gap": seconds between keys,
#    "raw": true to return what was written (base64): before the first key, and for each key}
# Output: one JSON document on stdout with the timings (seconds) and byte counts.
import base64, json, os, pty, select, struct, sys, termios, fcntl, time

cfg = json.loads(sys.argv[1])
ESU = b"\x1b[?2026l"
t0 = time.monotonic()
pid, fd = pty.fork()
if pid == 0:
    fcntl.ioctl(0, termios.TIOCSWINSZ, struct.pack("HHHH", cfg["rows"], cfg["cols"], 0, 0))
    env = dict(os.environ)
    env.update(cfg["env"])
    for k in cfg.get("unset", []):
        env.pop(k, None)
    os.execvpe(cfg["argv"][0], cfg["argv"], env)

buf = bytearray()

def read_for(seconds, until=None):
    """Read until `seconds` pass or until(buf_since) is true; returns (bytes, time of match)."""
    start = len(buf)
    end = time.monotonic() + seconds
    while True:
        left = end - time.monotonic()
        if left <= 0:
            return bytes(buf[start:]), None
        r, _, _ = select.select([fd], [], [], left)
        if not r:
            continue
        try:
            chunk = os.read(fd, 65536)
        except OSError:
            return bytes(buf[start:]), None
        if not chunk:
            return bytes(buf[start:]), None
        buf.extend(chunk)
        if until is not None and until(bytes(buf[start:])):
            return bytes(buf[start:]), time.monotonic()

def cpu_seconds():
    """CPU time of the program so far: its main thread, and all its threads (Linux schedstat)."""
    try:
        with open(f"/proc/{pid}/schedstat") as f:
            main = int(f.read().split()[0]) / 1e9
        total = 0.0
        for t in os.listdir(f"/proc/{pid}/task"):
            with open(f"/proc/{pid}/task/{t}/schedstat") as f:
                total += int(f.read().split()[0]) / 1e9
        return main, total
    except (OSError, ValueError, IndexError):
        return None, None

ready = cfg["ready"].encode()
_, t_ready = read_for(20, lambda b: ready in b and b.rstrip().endswith(ESU))
first_frame = (t_ready - t0) if t_ready else None
first_frame_cpu = cpu_seconds() if t_ready else (None, None)
read_for(0.3)  # let the start settle (resize handling, second frame)

results = []
raw = cfg.get("raw", False)
start_bytes = bytes(buf)
for step in cfg["steps"]:
    if "wait" in step:  # only let time pass (e.g. for the code cache to be written)
        read_for(step["wait"])
        continue
    data = step["send"].encode()
    start = len(buf)
    t_send = time.monotonic()
    os.write(fd, data)
    _, t_done = read_for(2, lambda b: ESU in b)
    read_for(cfg.get("gap", 0.12))  # until quiet: every byte this key caused
    results.append({"digit": step.get("digit", False), "first": step.get("first", False), "latency": (t_done - t_send) if t_done else None, "bytes": len(buf) - start})
    if raw:
        results[-1]["data"] = base64.b64encode(bytes(buf[start:])).decode()

def status():
    out = {}
    try:
        with open(f"/proc/{pid}/status") as f:
            for line in f:
                if line.startswith(("VmRSS:", "VmHWM:")):
                    k, v = line.split(":", 1)
                    out[k] = int(v.split()[0]) * 1024
    except OSError:
        pass
    return out

mem = status()
os.write(fd, b"\x03")
read_for(3, lambda b: False)
try:
    _, st = os.waitpid(pid, 0)
    code = os.waitstatus_to_exitcode(st)
except ChildProcessError:
    code = None
print(json.dumps({**({"start": base64.b64encode(start_bytes).decode()} if raw else {}), "firstFrame": first_frame, "firstFrameCpuMain": first_frame_cpu[0], "firstFrameCpuAll": first_frame_cpu[1], "steps": results, "total": len(buf), "mem": mem, "exitCode": code}))
