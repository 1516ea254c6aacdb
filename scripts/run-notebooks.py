#!/usr/bin/python3
"""Execute shalepoint's notebooks headless with the project-local TypeScript kernel.

Usage (from the repository root or anywhere):
    /usr/bin/python3 scripts/run-notebooks.py                  # every notebooks/*.ipynb
    /usr/bin/python3 scripts/run-notebooks.py notebooks/01-load-and-qc.ipynb
    options: --no-html (skip the HTML export), --timeout SECONDS (per cell, default 120),
             --from-root (start the kernel in the repository root instead of the notebook's folder)

For each notebook: starts the "tslab" kernel registered by scripts/install-kernel.mjs
(JUPYTER_PATH is pointed at .jupyter-local/share/jupyter), runs the cells in order with the
notebook's own folder as working directory, and stops at the first failing cell, printing
its source and everything the kernel wrote to stderr (tslab reports compile and run-time
errors there only). Executed copies go to notebooks/executed/ (git-ignored) with an HTML
export of each (nbconvert), so a reviewer can open the figures in a browser.

Needs Debian's python3-nbclient, python3-ipykernel and jupyter-nbconvert, the kernel
(`npm run kernel:install`) and the compiled package (`npm run build`).
Ends with the line "N passed, M failed"; exit status 0 only when nothing failed.
"""
import argparse
import os
import sys
import time

ROOT = os.path.dirname(os.path.dirname(os.path.abspath(__file__)))
KERNEL_DIR = os.path.join(ROOT, ".jupyter-local", "share", "jupyter")
NOTEBOOK_DIR = os.path.join(ROOT, "notebooks")
OUT_DIR = os.path.join(NOTEBOOK_DIR, "executed")

# The kernel spec must be visible before jupyter_client is imported.
os.environ["JUPYTER_PATH"] = KERNEL_DIR + (os.pathsep + os.environ["JUPYTER_PATH"] if os.environ.get("JUPYTER_PATH") else "")

import nbformat  # noqa: E402
from nbclient import NotebookClient  # noqa: E402
from nbclient.exceptions import CellExecutionError, CellTimeoutError, DeadKernelError  # noqa: E402


def stream_text(cell, name):
    """Text the kernel wrote to one stream (stdout/stderr) while running this cell."""
    return "".join(o.get("text", "") for o in cell.get("outputs", []) if o.get("output_type") == "stream" and o.get("name") == name)


def error_text(cell):
    """ename/evalue/traceback of any error output of the cell."""
    parts = []
    for o in cell.get("outputs", []):
        if o.get("output_type") == "error":
            parts.append("{}: {}".format(o.get("ename", ""), o.get("evalue", "")))
            parts.extend(o.get("traceback", []))
    return "\n".join(parts)


def indent(text, prefix="    | "):
    return "\n".join(prefix + line for line in text.rstrip("\n").split("\n"))


def export_html(nb, path):
    from nbconvert import HTMLExporter

    body, _ = HTMLExporter().from_notebook_node(nb)
    with open(path, "w", encoding="utf-8") as f:
        f.write(body)


def run_one(path, timeout, html, workdir=None):
    """Run one notebook; returns True when every cell succeeded."""
    name = os.path.basename(path)
    nb = nbformat.read(path, as_version=4)
    client = NotebookClient(
        nb,
        kernel_name="tslab",
        timeout=timeout,
        startup_timeout=60,
        allow_errors=False,
        resources={"metadata": {"path": workdir or os.path.dirname(os.path.abspath(path))}},
    )
    start = time.monotonic()
    failed_at = None
    failure = ""
    try:
        with client.setup_kernel():
            for index, cell in enumerate(nb.cells):
                if cell.cell_type != "code":
                    continue
                try:
                    client.execute_cell(cell, index)
                except (CellExecutionError, CellTimeoutError, DeadKernelError) as exc:
                    failed_at = index
                    ename = getattr(exc, "ename", None) or type(exc).__name__
                    evalue = getattr(exc, "evalue", None) or str(exc).strip().split("\n")[-1]
                    # tslab sends placeholder names ("<Error>"); the real text is on stderr below.
                    failure = ename if not evalue or str(evalue).startswith(ename) else "{}: {}".format(ename, str(evalue)[:500])
                    break
                # tslab may report a compile error only on stderr with an "ok" reply.
                if any(o.get("output_type") == "error" for o in cell.get("outputs", [])):
                    failed_at = index
                    failure = "error output"
                    break
    except Exception as exc:  # kernel failed to start, etc.
        failure = "{}: {}".format(type(exc).__name__, exc)
        failed_at = -1
    seconds = time.monotonic() - start

    os.makedirs(OUT_DIR, exist_ok=True)
    out_path = os.path.join(OUT_DIR, name)
    nbformat.write(nb, out_path)
    if failed_at is None:
        if html:
            html_path = os.path.join(OUT_DIR, os.path.splitext(name)[0] + ".html")
            export_html(nb, html_path)
            print("ok    {} ({:.1f} s) -> {}".format(name, seconds, os.path.relpath(html_path, ROOT)))
        else:
            print("ok    {} ({:.1f} s)".format(name, seconds))
        return True

    print("FAIL  {} ({:.1f} s)".format(name, seconds))
    if failed_at >= 0:
        cell = nb.cells[failed_at]
        print("  cell {} failed: {}".format(failed_at, failure))
        print("  source:")
        print(indent(cell.source))
        err = stream_text(cell, "stderr")
        if err:
            print("  kernel stderr:")
            print(indent(err))
        tb = error_text(cell)
        if tb:
            print("  error output:")
            print(indent(tb))
    else:
        print("  " + failure)
    print("  executed copy: {}".format(os.path.relpath(out_path, ROOT)))
    return False


def main(argv=None):
    ap = argparse.ArgumentParser(description=__doc__.split("\n")[0])
    ap.add_argument("notebooks", nargs="*", help="notebook files (default: notebooks/*.ipynb)")
    ap.add_argument("--timeout", type=int, default=120, help="seconds per cell (default 120)")
    ap.add_argument("--no-html", action="store_true", help="skip the HTML export")
    ap.add_argument("--from-root", action="store_true", help="start the kernel in the repository root")
    args = ap.parse_args(argv)

    if not os.path.isfile(os.path.join(KERNEL_DIR, "kernels", "tslab", "kernel.json")):
        print("run-notebooks: the tslab kernel is not registered; run `npm run kernel:install`.")
        print("0 passed, 1 failed")
        return 1
    if not os.path.isfile(os.path.join(ROOT, "dist", "index.js")):
        print("run-notebooks: dist/index.js is missing; run `npm run build` first.")
        print("0 passed, 1 failed")
        return 1
    paths = args.notebooks or sorted(
        os.path.join(NOTEBOOK_DIR, f) for f in os.listdir(NOTEBOOK_DIR) if f.endswith(".ipynb")
    )
    passed = failed = 0
    for p in paths:
        if run_one(os.path.abspath(p), args.timeout, not args.no_html, ROOT if args.from_root else None):
            passed += 1
        else:
            failed += 1
            break  # fail fast
    print("{} passed, {} failed".format(passed, failed))
    return 0 if failed == 0 and passed > 0 else 1


if __name__ == "__main__":
    sys.exit(main())
