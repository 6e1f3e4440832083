# Two commands do all the set-up on a fresh machine with python3 and make:
#   make demo   create .venv, install, run the demo
#   make test   create .venv, install, run the tests
PYTHON ?= python3
VENV := .venv
BIN := $(VENV)/bin
STAMP := $(VENV)/.installed

.PHONY: demo test bench clean

$(STAMP): pyproject.toml
	$(PYTHON) -m venv $(VENV)
	$(BIN)/python -m pip install -q --upgrade pip
	$(BIN)/python -m pip install -q -e '.[all,test]'
	touch $(STAMP)

demo: $(STAMP)
	$(BIN)/python demo/run_demo.py

test: $(STAMP)
	$(BIN)/python -m pytest

bench: $(STAMP)
	$(BIN)/python -m pip install -q -e '.[bench]'
	$(BIN)/python bench/bench_startup.py
	$(BIN)/python bench/bench_render.py
	$(BIN)/python bench/bench_analyses.py
	$(BIN)/python bench/bench_docx.py
	$(BIN)/python bench/bench_describe.py
	$(BIN)/python bench/bench_audit.py
	$(BIN)/python bench/bench_figures.py
	$(BIN)/python bench/bench_scaling.py

clean:
	rm -rf $(VENV) dist build demo/out bench/out
