"""The scheduler interleaves languages within a bounded window and loses nothing."""

from harness.engine.scheduling import CostModel, interleave


def test_grouped_input_is_interleaved_compiled_groups_first():
    items = [("py", i) for i in range(3)] + [("rs", i) for i in range(3)]
    order = list(interleave(items, group_of=lambda x: x[0], priority_of=lambda g: g == "rs"))
    assert order == [("rs", 0), ("py", 0), ("rs", 1), ("py", 1), ("rs", 2), ("py", 2)]


def test_every_item_comes_out_once_and_in_order_within_its_group():
    items = [(g, i) for i in range(50) for g in "abc" if (i * 7 + ord(g)) % 3]
    order = list(interleave(items, group_of=lambda x: x[0], priority_of=lambda g: 0, window=8))
    assert sorted(order) == sorted(items)
    for group in "abc":
        assert [x for x in order if x[0] == group] == [x for x in items if x[0] == group]


def test_the_window_bounds_how_far_ahead_input_is_read():
    consumed = []

    def source():
        for i in range(100):
            consumed.append(i)
            yield ("g", i)

    stream = interleave(source(), group_of=lambda x: x[0], priority_of=lambda g: 0, window=10)
    next(stream)
    assert len(consumed) <= 11


def test_a_group_measured_costlier_goes_first_whatever_its_prior():
    # With warm compilers a compiled language can cost less than an interpreted one: what the
    # run measured decides, the prior only until then.
    costs = CostModel(lambda group: 1.0 if group == "java" else 0.1)
    items = [(g, i) for i in range(4) for g in ("java", "python")]
    assert [g for g, _ in interleave(items, group_of=lambda x: x[0], priority_of=costs)][:2] == ["java", "python"]
    for seconds in (0.05, 0.04, 0.06):
        costs.observe("java", seconds)
    costs.observe("python", 0.3)
    assert [g for g, _ in interleave(items, group_of=lambda x: x[0], priority_of=costs)][:2] == ["python", "java"]


def test_the_cost_estimate_is_an_exponential_moving_average():
    costs = CostModel(lambda group: 5.0, weight=0.5)
    assert costs("g") == 5.0
    costs.observe("g", 2.0)
    costs.observe("g", 4.0)
    assert costs("g") == 3.0  # 2 + 0.5 * (4 - 2)
