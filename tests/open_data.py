"""Open data shared by the tests.

SLEEP: Student's (1908) sleep data, extra hours of sleep under two drugs for
ten patients, as printed in R's datasets::sleep (values recalled from memory).
"""

import pandas as pd

SLEEP = pd.DataFrame(
    {
        "drug1": [0.7, -1.6, -0.2, -1.2, -0.1, 3.4, 3.7, 0.8, 0.0, 2.0],
        "drug2": [1.9, 0.8, 1.1, 0.1, -0.1, 4.4, 5.5, 1.6, 4.6, 3.4],
    }
)
