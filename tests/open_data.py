"""Open data shared by the tests.

SLEEP: Student's (1908) sleep data, extra hours of sleep under two drugs for
ten patients, as printed in R's datasets::sleep (recalled from memory, then checked against
`Rscript -e 'print(sleep)'` on the development machine, R 4.x). SLEEP_LONG is
the same data in R's own long form: extra, group ("1", "2"), ID.
"""

import pandas as pd

SLEEP = pd.DataFrame(
    {
        "drug1": [0.7, -1.6, -0.2, -1.2, -0.1, 3.4, 3.7, 0.8, 0.0, 2.0],
        "drug2": [1.9, 0.8, 1.1, 0.1, -0.1, 4.4, 5.5, 1.6, 4.6, 3.4],
    }
)

SLEEP_LONG = pd.DataFrame(
    {
        "extra": list(SLEEP.drug1) + list(SLEEP.drug2),
        "group": ["1"] * 10 + ["2"] * 10,
        "ID": list(range(1, 11)) * 2,
    }
)
