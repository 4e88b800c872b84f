"""Cross-check expected values in the bundled ``core`` problem set against outside sources.

Each test loads one problem file and recomputes every case's expected value with Python's
standard library or numpy, independently of the problem's own reference solution, so a slip
in a hand-written expectation shows up here. The comment beside each check names the outside
function used. Nothing from ``harness`` is imported, so these tests stand on their own.
"""

from __future__ import annotations

import bisect
import collections
import fnmatch
import fractions
import graphlib
import heapq
import itertools
import math
import re
import statistics
import string
import textwrap
from pathlib import Path

import numpy
import pytest
import yaml

CORE = Path(__file__).resolve().parents[1] / "problem_sets" / "core"


def load_cases(problem_id: str) -> tuple[dict, list[dict]]:
    path = CORE / f"{problem_id}.yaml"
    data = yaml.safe_load(path.read_text(encoding="utf-8"))
    assert data["id"] == problem_id
    cases = data["cases"]
    assert cases, f"{problem_id} has no cases"
    return data, cases


def close(expected: float, actual: float, tolerance: float) -> bool:
    return math.isclose(float(actual), float(expected), rel_tol=tolerance, abs_tol=tolerance)


def test_core_set_has_sixty_problem_files_named_after_their_ids():
    files = sorted(p for p in CORE.glob("*.yaml") if p.name != "set.yaml")
    assert len(files) == 60
    for path in files:
        data = yaml.safe_load(path.read_text(encoding="utf-8"))
        assert data["id"] == path.stem
    meta = yaml.safe_load((CORE / "set.yaml").read_text(encoding="utf-8"))
    assert meta["name"] == "core"


def test_mean_catch_expected_values_match_statistics_fmean():
    data, cases = load_cases("mean_catch")
    for case in cases:
        (weights,) = case["args"]
        if not weights:
            assert case["expected"] is None
            continue
        # outside source: statistics.fmean
        assert close(case["expected"], statistics.fmean(weights), data["tolerance"]), case


def test_median_depth_expected_values_match_statistics_median():
    data, cases = load_cases("median_depth")
    for case in cases:
        (depths,) = case["args"]
        if not depths:
            assert case["expected"] is None
            continue
        # outside source: statistics.median
        assert close(case["expected"], statistics.median(depths), data["tolerance"]), case


def test_population_spread_expected_values_match_statistics_pstdev():
    data, cases = load_cases("population_spread")
    for case in cases:
        (values,) = case["args"]
        if not values:
            assert case["expected"] == 0.0
            continue
        # outside source: statistics.pstdev
        assert close(case["expected"], statistics.pstdev(values), data["tolerance"]), case


def test_weighted_mean_expected_values_match_numpy_average():
    data, cases = load_cases("weighted_mean")
    for case in cases:
        values, weights = case["args"]
        if math.fsum(weights) == 0:
            assert case["expected"] is None
            continue
        # outside source: numpy.average with weights=
        got = float(numpy.average(values, weights=weights))
        assert close(case["expected"], got, data["tolerance"]), case


def test_trailing_averages_expected_values_match_numpy_convolve():
    data, cases = load_cases("trailing_averages")
    for case in cases:
        values, window = case["args"]
        if len(values) < window:
            assert case["expected"] == []
            continue
        # outside source: numpy.convolve in "valid" mode with a flat window
        got = numpy.convolve(values, numpy.ones(window) / window, mode="valid").tolist()
        assert len(got) == len(case["expected"]), case
        assert all(close(e, g, data["tolerance"]) for e, g in zip(case["expected"], got)), case


def test_route_length_expected_values_match_math_dist():
    data, cases = load_cases("route_length")
    for case in cases:
        (points,) = case["args"]
        # outside source: math.dist over itertools.pairwise
        got = math.fsum(math.dist(p, q) for p, q in itertools.pairwise(points))
        assert close(case["expected"], got, data["tolerance"]), case


def test_average_by_boat_expected_values_match_statistics_fmean_per_boat():
    data, cases = load_cases("average_by_boat")
    for case in cases:
        (catches,) = case["args"]
        by_boat = collections.defaultdict(list)
        for boat, weight in catches:
            by_boat[boat].append(weight)
        # outside source: statistics.fmean per boat
        got = {boat: statistics.fmean(ws) for boat, ws in by_boat.items()}
        assert got.keys() == case["expected"].keys(), case
        assert all(close(case["expected"][b], got[b], data["tolerance"]) for b in got), case


def test_binomial_row_expected_values_match_math_comb():
    _, cases = load_cases("binomial_row")
    for case in cases:
        (n,) = case["args"]
        # outside source: math.comb
        assert case["expected"] == [math.comb(n, k) for k in range(n + 1)], n


def test_common_bundle_size_expected_values_match_math_gcd():
    _, cases = load_cases("common_bundle_size")
    for case in cases:
        (counts,) = case["args"]
        # outside source: math.gcd (variadic; gcd() of nothing is 0)
        assert case["expected"] == math.gcd(*counts), case


def test_add_fractions_expected_values_match_fractions_fraction():
    _, cases = load_cases("add_fractions")
    for case in cases:
        (fracs,) = case["args"]
        # outside source: fractions.Fraction (normalised, positive denominator)
        total = sum((fractions.Fraction(p, q) for p, q in fracs), fractions.Fraction(0))
        assert case["expected"] == [total.numerator, total.denominator], case


def test_prime_exponents_expected_values_multiply_back_to_n_with_prime_keys():
    _, cases = load_cases("prime_exponents")
    for case in cases:
        (n,) = case["args"]
        factors = {int(p): e for p, e in case["expected"].items()}
        assert all(str(p) == key for p, key in zip(factors, case["expected"]))
        assert all(e >= 1 for e in factors.values())
        # outside source: math.prod rebuilds n; math.isqrt bounds a trial-division primality test
        assert math.prod(p**e for p, e in factors.items()) == n, case
        for p in factors:
            assert p >= 2 and all(p % d for d in range(2, math.isqrt(p) + 1)), p


def test_beacon_base_code_expected_values_match_numpy_base_repr_and_int_parsing():
    _, cases = load_cases("beacon_base_code")
    for case in cases:
        n, base = case["args"]
        # outside source: numpy.base_repr (uppercase digits, leading "-" for negatives)
        assert case["expected"] == numpy.base_repr(n, base).lower(), case
        # outside source: int(text, base) parses the representation back
        assert int(case["expected"], base) == n, case


def test_ledger_digit_sum_expected_values_match_decimal_string_digits():
    _, cases = load_cases("ledger_digit_sum")
    for case in cases:
        (n,) = case["args"]
        # outside source: str() decimal formatting of the absolute value
        assert case["expected"] == sum(int(d) for d in str(abs(n))), case


def test_is_power_of_two_expected_values_match_int_bit_count():
    _, cases = load_cases("is_power_of_two")
    for case in cases:
        (n,) = case["args"]
        # outside source: int.bit_count
        assert case["expected"] == (n > 0 and n.bit_count() == 1), case


def test_lamp_mask_bits_expected_values_match_int_bit_count_of_unsigned_64_bit_form():
    _, cases = load_cases("lamp_mask_bits")
    for case in cases:
        (mask,) = case["args"]
        # outside source: int.bit_count on the value reduced to 64 unsigned bits
        assert case["expected"] == (mask & (2**64 - 1)).bit_count(), case


def test_running_balance_expected_values_match_itertools_accumulate():
    _, cases = load_cases("running_balance")
    for case in cases:
        (deltas,) = case["args"]
        # outside source: itertools.accumulate
        assert case["expected"] == list(itertools.accumulate(deltas)), case


def test_buoy_gaps_expected_values_match_itertools_pairwise():
    _, cases = load_cases("buoy_gaps")
    for case in cases:
        (positions,) = case["args"]
        # outside source: itertools.pairwise
        assert case["expected"] == [b - a for a, b in itertools.pairwise(positions)], case


def test_column_totals_expected_values_match_itertools_zip_longest():
    _, cases = load_cases("column_totals")
    for case in cases:
        (grid,) = case["args"]
        # outside source: itertools.zip_longest with fillvalue=0
        assert case["expected"] == [sum(col) for col in itertools.zip_longest(*grid, fillvalue=0)], case


def test_grid_product_expected_values_match_numpy_matmul():
    _, cases = load_cases("grid_product")
    for case in cases:
        a, b = case["args"]
        if not a:
            assert case["expected"] == []
            continue
        # outside source: numpy.matmul on int64 arrays
        got = numpy.matmul(numpy.array(a, dtype=numpy.int64), numpy.array(b, dtype=numpy.int64))
        assert case["expected"] == got.tolist(), case


def test_glyph_counts_expected_values_match_collections_counter():
    _, cases = load_cases("glyph_counts")
    for case in cases:
        (text,) = case["args"]
        # outside source: collections.Counter
        assert case["expected"] == dict(collections.Counter(text)), case


def test_merge_tallies_expected_values_match_collections_counter_update():
    _, cases = load_cases("merge_tallies")
    for case in cases:
        a, b = case["args"]
        # outside source: collections.Counter.update (keeps zero and negative counts)
        merged = collections.Counter(a)
        merged.update(b)
        assert case["expected"] == dict(merged), case


def test_most_common_species_expected_values_match_counter_with_smallest_name_on_ties():
    _, cases = load_cases("most_common_species")
    for case in cases:
        (species,) = case["args"]
        if not species:
            assert case["expected"] is None
            continue
        # outside source: collections.Counter.most_common, ties broken by min()
        ranked = collections.Counter(species).most_common()
        top = ranked[0][1]
        assert case["expected"] == min(name for name, count in ranked if count == top), case


def test_run_length_encode_expected_values_match_itertools_groupby():
    _, cases = load_cases("run_length_encode")
    for case in cases:
        (text,) = case["args"]
        # outside source: itertools.groupby
        got = "".join(f"{len(list(group))}{ch}" for ch, group in itertools.groupby(text))
        assert case["expected"] == got, case


def test_run_length_decode_expected_values_match_re_findall_groups():
    _, cases = load_cases("run_length_decode")
    for case in cases:
        (code,) = case["args"]
        # outside source: re.fullmatch checks the shape, re.findall splits count/character groups
        assert re.fullmatch(r"(?:[1-9][0-9]*[^0-9])*", code), code
        got = "".join(ch * int(count) for count, ch in re.findall(r"([0-9]+)([^0-9])", code))
        assert case["expected"] == got, case


def test_collapse_spaces_expected_values_match_re_sub():
    _, cases = load_cases("collapse_spaces")
    for case in cases:
        (text,) = case["args"]
        # outside source: re.sub over runs of space, tab and newline
        assert case["expected"] == re.sub(r"[ \t\n]+", " ", text).strip(" "), case


def test_reverse_word_order_expected_values_match_str_split():
    _, cases = load_cases("reverse_word_order")
    for case in cases:
        (line,) = case["args"]
        assert not any(ch.isspace() and ch != " " for ch in line), "cases use plain spaces only"
        # outside source: str.split() with no separator drops empty words
        assert case["expected"] == " ".join(reversed(line.split())), case


def test_plate_palindrome_expected_values_match_re_filtered_reversal():
    _, cases = load_cases("plate_palindrome")
    for case in cases:
        (plate,) = case["args"]
        # outside source: re.sub keeps ASCII letters and digits; str.lower folds case
        kept = re.sub(r"[^A-Za-z0-9]", "", plate).lower()
        assert case["expected"] == (kept == kept[::-1]), case


def test_lamp_cipher_expected_values_match_str_translate_with_rotated_alphabet():
    _, cases = load_cases("lamp_cipher")
    for case in cases:
        text, shift = case["args"]
        k = shift % 26
        lower, upper = string.ascii_lowercase, string.ascii_uppercase
        # outside source: str.maketrans / str.translate with string.ascii_* alphabets
        table = str.maketrans(lower + upper, lower[k:] + lower[:k] + upper[k:] + upper[:k])
        assert case["expected"] == text.translate(table), case


def test_wrap_notice_expected_values_match_textwrap_wrap_without_breaking_words():
    _, cases = load_cases("wrap_notice")
    for case in cases:
        words, width = case["args"]
        # outside source: textwrap.wrap, long words kept whole, no hyphen breaks
        got = textwrap.wrap(" ".join(words), width=width, break_long_words=False, break_on_hyphens=False)
        assert case["expected"] == got, case


def test_manifest_match_expected_values_match_fnmatch_fnmatchcase():
    _, cases = load_cases("manifest_match")
    for case in cases:
        pattern, text = case["args"]
        assert "[" not in pattern, "fnmatch treats [ specially; the problem does not"
        # outside source: fnmatch.fnmatchcase (case-sensitive shell-style matching)
        assert case["expected"] == fnmatch.fnmatchcase(text, pattern), case


def test_longest_rising_chain_expected_values_match_bisect_patience_piles():
    _, cases = load_cases("longest_rising_chain")
    for case in cases:
        (values,) = case["args"]
        tails: list[int] = []
        for value in values:
            # outside source: bisect.bisect_left keeps the smallest tail per chain length
            i = bisect.bisect_left(tails, value)
            if i == len(tails):
                tails.append(value)
            else:
                tails[i] = value
        assert case["expected"] == len(tails), case


def test_best_cargo_expected_values_match_exhaustive_itertools_combinations():
    _, cases = load_cases("best_cargo")
    for case in cases:
        weights, values, capacity = case["args"]
        best = 0
        # outside source: itertools.combinations enumerates every subset of crates
        for r in range(len(weights) + 1):
            for chosen in itertools.combinations(range(len(weights)), r):
                if sum(weights[i] for i in chosen) <= capacity:
                    best = max(best, sum(values[i] for i in chosen))
        assert case["expected"] == best, case


def test_loading_order_expected_values_match_graphlib_topological_sorter():
    _, cases = load_cases("loading_order")
    for case in cases:
        (deps,) = case["args"]
        # outside source: graphlib.TopologicalSorter (cycle detection and readiness tracking)
        sorter = graphlib.TopologicalSorter()
        for item, before in deps.items():
            sorter.add(item, *before)
        try:
            sorter.prepare()
        except graphlib.CycleError:
            assert case["expected"] is None, case
            continue
        ready: list[str] = []
        order = []
        while sorter.is_active():
            for item in sorter.get_ready():
                heapq.heappush(ready, item)
            item = heapq.heappop(ready)
            order.append(item)
            sorter.done(item)
        assert case["expected"] == order, case


@pytest.mark.parametrize(
    "problem_id",
    ["mean_catch", "median_depth", "weighted_mean", "route_length", "trailing_averages", "average_by_boat"],
)
def test_problems_with_float_results_declare_a_tolerance(problem_id):
    data, _ = load_cases(problem_id)
    assert isinstance(data.get("tolerance"), float) and 0 < data["tolerance"] < 1
