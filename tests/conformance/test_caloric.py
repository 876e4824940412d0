"""The standard Jupyter kernel conformance suite (jupyter_kernel_test, Debian python3-jupyter-kernel-test)
run against the installed caloric kernelspec. Every sample attribute is filled; the vitest wrapper
(conformance.test.ts) fails the run on any skip.

Samples that depend on the cell language: echo(...) (stdout), show(...) (display_data), clear()
(clear_output), completion/inspect of built-in names, is_complete. `?name` help (pager payload) and
the stderr note for an unknown name are answered by the cell language (lib/language/helpQuery.ts); the kernel pages the one and writes the other to stderr.
"""
import unittest

import jupyter_kernel_test as jkt


class CaloricKernelTests(jkt.KernelTests):
    kernel_name = "caloric"
    language_name = "caloric"
    file_extension = ".clc"

    code_hello_world = 'echo("hello, world")'
    # Kernel-level help query for a name that does not exist: a note on stderr, status ok.
    code_stderr = "?no_such_name_anywhere"
    code_page_something = "?echo"
    code_generate_error = "no_such_name_anywhere + 1"
    code_execute_result = [
        {"code": "6*7", "result": "42"},
        {"code": "1+1", "result": "2"},
    ]
    code_display_data = [{"code": "show(2 m)", "mime": "text/plain"}]
    code_clear_output = "clear()"
    code_inspect_sample = "echo"
    completion_samples = [
        {"text": "ech", "matches": {"echo"}},
        {"text": "sqr"},
    ]
    complete_code_samples = ["1 + 1", "x = 3 m", "f(x) = x^2"]
    incomplete_code_samples = ["(1 +", "[1, 2", "f(x) ="]
    invalid_code_samples = ["1 +)", "]"]
    supported_history_operations = ("tail", "range", "search")
    code_history_pattern = "6*7"


if __name__ == "__main__":
    unittest.main()
