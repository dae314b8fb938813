#!/usr/bin/env python3
"""Keeps the man pages equal to the programs' help: every verb of lineward-cli with its one-line
description, and every option of each verb and of lineward with its text, must be in the man
page, and the man page may name no option the program does not have.

usage: man_pages_check.py LINEWARD_CLI LINEWARD DOCS_MAN_DIR
"""
import os
import re
import subprocess
import sys

errors = []


def help_of(cmd):
    env = dict(os.environ, QT_QPA_PLATFORM="offscreen")
    run = subprocess.run(cmd, capture_output=True, text=True, env=env)
    if run.returncode != 0:
        sys.exit(f"FAIL: {' '.join(cmd)} exited {run.returncode}: {run.stderr}")
    return run.stdout.splitlines()


def help_options(lines):
    """{"--name": "text"} of the option lines of a help text (CLI11's and Qt's layouts)."""
    options = {}
    for i, line in enumerate(lines):
        m = re.match(r"^\s+(?:-\w,\s?)?(--[a-z0-9-]+)(.*)$", line)
        if not m:
            continue
        # After the name: an optional value spec, two or more spaces, then the text.
        rest = re.match(r"^\s?(?:\S.*?)?\s{2,}(\S.*)$", m.group(2))
        text = rest.group(1).strip() if rest else ""
        if not text and i + 1 < len(lines) and re.match(r"^\s{8,}\S", lines[i + 1]):
            text = lines[i + 1].strip()  # CLI11 puts the text under a long option
        options[m.group(1)] = text
    return options


def unescape(troff):
    text = troff.replace("\\-", "-").replace("\\(em", "\u2014").replace("\\(->", "\u2192")
    return re.sub(r"\\f[BIR]", "", text)


def man_sections(path):
    """{section: {"intro": first text line, "entries": {head: text}}} for .SH and .SS."""
    sections, current, head = {}, None, None
    with open(path, encoding="utf-8") as f:
        lines = [line.rstrip("\n") for line in f]
    for i, line in enumerate(lines):
        if line.startswith(".SH ") or line.startswith(".SS "):
            current = line[4:].strip()
            sections[current] = {"intro": None, "entries": {}}
            head = None
        elif current is None or line.startswith(".\\\""):
            continue
        elif line == ".TP":
            head = re.sub(r"^\.(B|I|BI|BR|IR)\s+", "", unescape(lines[i + 1]))
        elif head is not None and not line.startswith("."):
            sections[current]["entries"][head] = unescape(line)
            head = None
        elif head is None and not line.startswith(".") and sections[current]["intro"] is None:
            sections[current]["intro"] = unescape(line)
    return sections


def man_options(entries):
    found = {}
    for head, text in entries.items():
        for name in re.findall(r"--[a-z0-9-]+", head):
            found[name] = text
    return found


def compare(where, help_opts, man_opts):
    help_opts = {k: v for k, v in help_opts.items() if k != "--help"}
    man_opts = {k: v for k, v in man_opts.items() if k != "--help"}
    for name in sorted(set(help_opts) - set(man_opts)):
        errors.append(f"{where}: {name} is in the help but not in the man page")
    for name in sorted(set(man_opts) - set(help_opts)):
        errors.append(f"{where}: {name} is in the man page but the program has no such option")
    for name in sorted(set(help_opts) & set(man_opts)):
        if help_opts[name] != man_opts[name]:
            errors.append(f"{where}: {name}: help says {help_opts[name]!r}, "
                          f"man page says {man_opts[name]!r}")


def main():
    cli, gui, man_dir = sys.argv[1:4]

    # lineward-cli: verbs and their descriptions, then each verb's options.
    top = help_of([cli, "--help"])
    verbs = {}
    in_verbs = False
    for line in top:
        if line.startswith("Subcommands:"):
            in_verbs = True
        elif in_verbs and re.match(r"^\s{2}\S", line):
            name, text = re.split(r"\s{2,}", line.strip(), maxsplit=1)
            verbs[name] = text
    if not verbs:
        errors.append("lineward-cli --help lists no verbs")
    man = man_sections(os.path.join(man_dir, "lineward-cli.1"))
    man_verbs = {s for s in man if s.islower()}
    for verb in sorted(set(verbs) - man_verbs):
        errors.append(f"lineward-cli.1: verb {verb} has no section")
    for verb in sorted(man_verbs - set(verbs)):
        errors.append(f"lineward-cli.1: section {verb} names no verb of lineward-cli")
    for verb in sorted(set(verbs) & man_verbs):
        if man[verb]["intro"] != verbs[verb]:
            errors.append(f"lineward-cli.1: {verb}: help says {verbs[verb]!r}, "
                          f"man page says {man[verb]['intro']!r}")
        compare(f"lineward-cli.1 {verb}", help_options(help_of([cli, verb, "--help"])),
                man_options(man[verb]["entries"]))

    # lineward: options and the file argument.
    gui_help = help_of([gui, "--help"])
    man = man_sections(os.path.join(man_dir, "lineward.1"))
    compare("lineward.1", help_options(gui_help), man_options(man["OPTIONS"]["entries"]))
    args = {}
    in_args = False
    for line in gui_help:
        if line.startswith("Arguments:"):
            in_args = True
        elif in_args and line.strip():
            name, text = re.split(r"\s{2,}", line.strip(), maxsplit=1)
            args[name] = text
    if args != man.get("ARGUMENTS", {}).get("entries"):
        errors.append(f"lineward.1: arguments {man.get('ARGUMENTS')} differ from the help {args}")

    if errors:
        print("FAIL:\n  " + "\n  ".join(errors))
        sys.exit(1)
    print(f"ok: {len(verbs)} verbs and their options match lineward-cli.1; lineward.1 matches")


if __name__ == "__main__":
    main()
