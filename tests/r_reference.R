# The R outputs stored as constants in tests/test_analyses_repeated.py and tests/test_analyses_posthoc.py,
# produced by this script (R 4.x, base packages only). Re-run it to check them:
#   python -c "import pingouin as pg; [pg.read_dataset(n).to_csv(f'/tmp/{n}.csv', index=False) for n in ('chi2_mcnemar', 'cochran', 'rm_anova_wide')]"
#   Rscript tests/r_reference.R
options(digits = 15)

# McNemar on pingouin's chi2_mcnemar
m <- read.csv("/tmp/chi2_mcnemar.csv"); t <- table(m$treatment_X, m$treatment_Y)
a <- mcnemar.test(t); b <- mcnemar.test(t, correct = FALSE); bt <- binom.test(t[1, 2], t[1, 2] + t[2, 1])
cat("mcnemar corrected", a$statistic, a$p.value, "uncorrected", b$statistic, b$p.value, "\n")
cat("binom p", bt$p.value, "ci", bt$conf.int, "\n")

# Friedman on the rounding-times example of ?friedman.test, as typed in the test
RoundingTimes <- matrix(c(5.40, 5.50, 5.55, 5.85, 5.70, 5.75, 5.20, 5.60, 5.50, 5.55, 5.50, 5.40, 5.90, 5.85, 5.70, 5.45, 5.55, 5.60,
                          5.40, 5.40, 5.35, 5.45, 5.50, 5.35, 5.25, 5.15, 5.00, 5.85, 5.80, 5.70, 5.25, 5.20, 5.10, 5.65, 5.55, 5.45,
                          5.60, 5.35, 5.45, 5.05, 5.00, 4.95, 5.50, 5.50, 5.40, 5.45, 5.55, 5.50, 5.55, 5.55, 5.35, 5.45, 5.50, 5.55,
                          5.50, 5.45, 5.25, 5.65, 5.60, 5.40, 5.70, 5.65, 5.55, 6.30, 6.30, 6.25), nrow = 22, byrow = TRUE)
f <- friedman.test(RoundingTimes); cat("friedman", f$statistic, f$parameter, f$p.value, "\n")

# Cochran's Q by its formula on pingouin's cochran data
q <- read.csv("/tmp/cochran.csv"); w <- reshape(q, idvar = "Subject", timevar = "Time", direction = "wide"); X <- as.matrix(w[, -1]); k <- ncol(X)
C <- colSums(X); R <- rowSums(X); Tt <- sum(X); Q <- (k - 1) * (k * sum(C^2) - Tt^2) / (k * Tt - sum(R^2))
cat("cochran", Q, k - 1, pchisq(Q, k - 1, lower.tail = FALSE), "\n")

# One-way repeated-measures ANOVA with sphericity on pingouin's rm_anova_wide (complete rows)
Y <- as.matrix(read.csv("/tmp/rm_anova_wide.csv")); fit <- lm(Y ~ 1); idata <- data.frame(cond = factor(colnames(Y)))
print(unclass(anova(fit, M = ~cond, X = ~1, idata = idata, test = "Spherical")))
print(mauchly.test(fit, M = ~cond, X = ~1, idata = idata))

# Tukey HSD on PlantGrowth, and ptukey at statsetter's quantiles (df >= 5) are in tests/test_analyses_posthoc.py:
print(TukeyHSD(aov(weight ~ group, data = PlantGrowth))$group, digits = 15)

# Moderation on mtcars (tests/test_analyses_moderation.py)
d <- mtcars; d$hp_c <- d$hp - mean(d$hp); d$wt_c <- d$wt - mean(d$wt)
f <- lm(mpg ~ hp_c * wt_c, data = d); print(coef(summary(f))); cat("r2", summary(f)$r.squared, "\n")
for (v in c(mean(d$wt) - sd(d$wt), mean(d$wt), mean(d$wt) + sd(d$wt))) {
  g <- lm(mpg ~ hp * I(wt - v), data = d); cat("slope at", v, coef(summary(g))["hp", ], confint(g)["hp", ], "\n") }
V <- vcov(f); b <- coef(f); tc <- qt(0.975, f$df.residual)
tfun <- function(m) (b["hp_c"] + b["hp_c:wt_c"] * m) / sqrt(V["hp_c", "hp_c"] + 2 * m * V["hp_c", "hp_c:wt_c"] + m^2 * V["hp_c:wt_c", "hp_c:wt_c"])
g <- function(m) abs(tfun(m)) - tc
cat("jn", uniroot(g, c(0, 2), tol = 1e-13)$root + mean(d$wt), uniroot(g, c(2, 100), tol = 1e-13)$root + mean(d$wt), "\n")

# Mediation paths on pingouin's mediation data (tests/test_analyses_mediation.py):
#   python -c "import pingouin as pg; pg.read_dataset('mediation').to_csv('/tmp/mediation.csv', index=False)"
d <- read.csv("/tmp/mediation.csv")
cat("a", coef(summary(lm(M ~ X, d)))["X", ], confint(lm(M ~ X, d))["X", ], "\n")
b <- coef(summary(lm(Y ~ X + M, d))); cat("b", b["M", ], "\n"); cat("c'", b["X", ], "\n")
cat("c", coef(summary(lm(Y ~ X, d)))["X", ], "\n")

# ANCOVA on pingouin's ancova data (tests/test_analyses_ancova.py):
#   python -c "import pingouin as pg; pg.read_dataset('ancova').to_csv('/tmp/ancova.csv', index=False)"
d <- read.csv("/tmp/ancova.csv"); d$Method <- factor(d$Method)
f <- lm(Scores ~ Method + Income, d); print(drop1(f, test = "F"))
p <- predict(f, data.frame(Method = levels(d$Method), Income = mean(d$Income)), se.fit = TRUE, interval = "confidence"); print(cbind(p$fit, se = p$se.fit))
print(anova(f, lm(Scores ~ Method * Income, d)))

# Pairwise paired t tests after the repeated-measures ANOVA (tests/test_analyses_repeated.py)
Y <- na.omit(read.csv("/tmp/rm_anova_wide.csv")); n <- nrow(Y)
long <- data.frame(y = as.vector(as.matrix(Y)), cond = factor(rep(colnames(Y), each = n), levels = colnames(Y)))
print(pairwise.t.test(long$y, long$cond, paired = TRUE, p.adjust.method = "holm")$p.value)
print(pairwise.t.test(long$y, long$cond, paired = TRUE, p.adjust.method = "bonferroni")$p.value)
tt <- t.test(Y[, 1], Y[, 2], paired = TRUE, conf.level = 1 - 0.05 / 6); cat("ci12 bonf", tt$conf.int, tt$statistic, "\n")

# Linear mixed models (tests/test_analyses_multilevel.py): nlme's Orthodont, written to tests/data/orthodont.csv
library(nlme); data(Orthodont)
m <- lme(distance ~ age + Sex, random = ~1 | Subject, data = Orthodont, method = "REML"); print(summary(m)$tTable); print(VarCorr(m))
cat("ll", logLik(m), "AIC", AIC(m), "BIC", BIC(m), "\n")
m0 <- lme(distance ~ 1, random = ~1 | Subject, data = Orthodont, method = "REML"); v <- as.numeric(VarCorr(m0)[, 1]); cat("icc", v[1] / (v[1] + v[2]), "\n")
print(anova(lme(distance ~ age, random = ~1 | Subject, data = Orthodont, method = "ML"), lme(distance ~ age + Sex, random = ~1 | Subject, data = Orthodont, method = "ML")))
s <- lme(distance ~ age, random = ~age | Subject, data = Orthodont, method = "REML"); print(summary(s)$tTable); print(VarCorr(s))

# Mixed ANOVA (tests/test_analyses_repeated.py): python -c "import pingouin as pg; pg.read_dataset('mixed_anova').to_csv('/tmp/mixed.csv', index=False)"
d <- read.csv("/tmp/mixed.csv")
w <- reshape(d, idvar = c("Subject", "Group"), timevar = "Time", direction = "wide"); Y <- as.matrix(w[, grep("Scores", names(w))])
fit <- lm(Y ~ factor(w$Group)); idata <- data.frame(time = factor(colnames(Y)))
print(unclass(anova(fit, M = ~time, X = ~1, idata = idata, test = "Spherical"))); print(mauchly.test(fit, M = ~time, X = ~1, idata = idata))
d$Subject <- factor(d$Subject); print(summary(aov(Scores ~ Group * Time + Error(Subject / Time), data = d)))

# Two within factors (tests/test_analyses_repeated.py): python -c "import pingouin as pg; pg.read_dataset('rm_anova2').to_csv('/tmp/rm_anova2.csv', index=False)"
d <- read.csv("/tmp/rm_anova2.csv"); d$cell <- paste(d$Time, d$Metric, sep = ".")
w <- reshape(d[, c("Subject", "cell", "Performance")], idvar = "Subject", timevar = "cell", direction = "wide")
Y <- as.matrix(w[, -1]); cells <- sub("Performance.", "", colnames(Y)); fit <- lm(Y ~ 1)
idata <- data.frame(Time = factor(sub("\\..*", "", cells)), Metric = factor(sub(".*\\.", "", cells)))
print(anova(fit, idata = idata, X = ~1, M = ~Time, test = "Spherical"))
print(anova(fit, idata = idata, X = ~Time, M = ~Time + Metric, test = "Spherical")); print(mauchly.test(fit, idata = idata, X = ~Time, M = ~Time + Metric))
print(anova(fit, idata = idata, X = ~Time + Metric, M = ~Time * Metric, test = "Spherical")); print(mauchly.test(fit, idata = idata, X = ~Time + Metric, M = ~Time * Metric))

# Simple effects after the mixed ANOVA (the /tmp/mixed.csv written above): anova.mlm per group, anova(lm) per measurement
d <- read.csv("/tmp/mixed.csv")
for (g in sort(unique(d$Group))) {
  s <- d[d$Group == g, ]; w <- reshape(s[, c("Subject", "Time", "Scores")], idvar = "Subject", timevar = "Time", direction = "wide")
  Y <- as.matrix(w[, -1]); fit <- lm(Y ~ 1); print(anova(fit, M = ~time, X = ~1, idata = data.frame(time = factor(colnames(Y))), test = "Spherical"))
}
for (t in sort(unique(d$Time))) { a <- anova(lm(Scores ~ Group, data = d[d$Time == t, ])); cat(t, a$`F value`[1], a$`Pr(>F)`[1], "\n") }

# Moderation by a categorical moderator (tests/test_analyses_moderation.py), R's mtcars
print(summary(lm(mpg ~ factor(cyl) / hp, data = mtcars))$coefficients); print(summary(lm(mpg ~ hp * factor(cyl), data = mtcars))$coefficients)
print(anova(lm(mpg ~ hp + factor(cyl), data = mtcars), lm(mpg ~ hp * factor(cyl), data = mtcars)))

# Parallel mediators (tests/test_analyses_mediation.py): python -c "import pingouin as pg; pg.read_dataset('mediation').to_csv('/tmp/mediation.csv', index=False)"
d <- read.csv("/tmp/mediation.csv"); for (f in list(M ~ X, Mbin ~ X, Y ~ X + M + Mbin, Y ~ X)) print(summary(lm(f, data = d))$coefficients)

# Mixed-model comparison table (tests/test_analyses_multilevel.py): the interaction model against the additive one, ML fits
library(nlme)
a <- lme(distance ~ age + Sex, random = ~1 | Subject, data = Orthodont, method = "ML"); b <- lme(distance ~ age * Sex, random = ~1 | Subject, data = Orthodont, method = "ML")
print(anova(a, b))

# The error strata of the two-within design (the /tmp/rm_anova2.csv above)
d <- read.csv("/tmp/rm_anova2.csv"); d$Subject <- factor(d$Subject)
print(summary(aov(Performance ~ Time * Metric + Error(Subject / (Time * Metric)), data = d)))

# Two-factor ANCOVA (tests/test_analyses_ancova.py): python -c "import pingouin as pg; pg.read_dataset('penguins').to_csv('/tmp/penguins.csv', index=False)"
d <- na.omit(read.csv("/tmp/penguins.csv")[, c("body_mass_g", "species", "sex", "flipper_length_mm")]); d <- d[d$sex != "", ]
full <- lm(body_mass_g ~ species * sex + flipper_length_mm, data = d); mse <- deviance(full) / df.residual(full)
type2 <- function(small, big) { ss <- deviance(small) - deviance(big); k <- df.residual(small) - df.residual(big); f <- ss / k / mse
  c(ss = ss, df = k, F = f, p = pf(f, k, df.residual(full), lower.tail = FALSE)) }
add <- lm(body_mass_g ~ species + sex + flipper_length_mm, data = d)
print(rbind(species = type2(lm(body_mass_g ~ sex + flipper_length_mm, data = d), add), sex = type2(lm(body_mass_g ~ species + flipper_length_mm, data = d), add),
            inter = type2(add, full), flipper = type2(lm(body_mass_g ~ species * sex, data = d), full)))
g <- expand.grid(species = sort(unique(d$species)), sex = sort(unique(d$sex)), flipper_length_mm = mean(d$flipper_length_mm))
p <- predict(full, newdata = g, se.fit = TRUE); print(cbind(g[, 1:2], fit = p$fit, se = p$se.fit))
options(contrasts = c("contr.sum", "contr.poly")); print(drop1(lm(body_mass_g ~ species * sex + flipper_length_mm, data = d), . ~ ., test = "F"))

# The 95% CI of each PlantGrowth group's mean (tests/test_figures.py)
for (g in c("ctrl", "trt1", "trt2")) print(t.test(PlantGrowth$weight[PlantGrowth$group == g])$conf.int)
for (g in c("ctrl", "trt1", "trt2")) print(quantile(PlantGrowth$weight[PlantGrowth$group == g], c(.25, .5, .75)))

# p values adjusted for multiple comparisons on R's airquality example (tests/test_analyses_posthoc.py)
pw <- pairwise.t.test(airquality$Ozone, factor(airquality$Month), p.adjust.method = "none")$p.value
p <- pw[lower.tri(pw, diag = TRUE)]; p <- p[!is.na(p)]
options(digits = 17); print(p); for (m in c("holm", "bonferroni", "BH")) print(p.adjust(p, m))
