"""Open data shared by the tests.

SLEEP: Student's (1908) sleep data, extra hours of sleep under two drugs for
ten patients, as printed in R's datasets::sleep (recalled from memory, then checked against
`Rscript -e 'print(sleep)'` on the development machine, R 4.x). SLEEP_LONG is
the same data in R's own long form: extra, group ("1", "2"), ID.

MTCARS: mpg, wt, hp and cyl of R's datasets::mtcars (Henderson & Velleman, 1981),
and PLANTS: R's datasets::PlantGrowth (Dobson, 1983), both printed by
`Rscript -e 'deparse(...)'` on the development machine (R 4.x).
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

MTCARS = pd.DataFrame(
    {
        "mpg": [21, 21, 22.8, 21.4, 18.7, 18.1, 14.3, 24.4, 22.8, 19.2, 17.8, 16.4, 17.3, 15.2, 10.4, 10.4, 14.7, 32.4, 30.4, 33.9, 21.5, 15.5,
                15.2, 13.3, 19.2, 27.3, 26, 30.4, 15.8, 19.7, 15, 21.4],
        "wt": [2.62, 2.875, 2.32, 3.215, 3.44, 3.46, 3.57, 3.19, 3.15, 3.44, 3.44, 4.07, 3.73, 3.78, 5.25, 5.424, 5.345, 2.2, 1.615, 1.835,
               2.465, 3.52, 3.435, 3.84, 3.845, 1.935, 2.14, 1.513, 3.17, 2.77, 3.57, 2.78],
        "hp": [110, 110, 93, 110, 175, 105, 245, 62, 95, 123, 123, 180, 180, 180, 205, 215, 230, 66, 52, 65, 97, 150, 150, 245, 175, 66, 91,
               113, 264, 175, 335, 109],
        "cyl": [6, 6, 4, 6, 8, 6, 8, 4, 4, 6, 6, 8, 8, 8, 8, 8, 8, 4, 4, 4, 4, 8, 8, 8, 8, 4, 4, 4, 8, 6, 8, 4],
    }
)

PLANTS = pd.DataFrame(
    {
        "weight": [4.17, 5.58, 5.18, 6.11, 4.5, 4.61, 5.17, 4.53, 5.33, 5.14, 4.81, 4.17, 4.41, 3.59, 5.87, 3.83, 6.03, 4.89, 4.32, 4.69, 6.31,
                   5.12, 5.54, 5.5, 5.37, 5.29, 4.92, 6.15, 5.8, 5.26],
        "group": ["ctrl"] * 10 + ["trt1"] * 10 + ["trt2"] * 10,
    }
)
