/*
 * Reading the example files (models.txt, profile.csv, reference.csv) written by the Java
 * program io.github.startransport.bridge.ExampleReference. Shared by the C example host, the
 * native tests and the native benchmark. Numbers are read with strtod, which gives back exactly
 * the double that Java's Double.toString wrote.
 */
#ifndef EXAMPLE_FILES_H
#define EXAMPLE_FILES_H

#define _GNU_SOURCE
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

/* The four models: family, name, options (in the order thermodynamics, opacity, stability, convection). */
struct example_models {
    char family[4][32];
    char name[4][64];
    char options[4][128];
};

/* The host's zones. */
struct example_profile {
    int n;
    double *radius, *mass, *temperature, *density, *pressure, *luminosity, *hydrogen, *metals, *nabla_mu;
};

/* Splits a CSV line in place: up to max fields, returns how many. */
static inline int example_split(char *line, char **fields, int max) {
    int count = 0;
    char *p = line;
    while (count < max) {
        fields[count++] = p;
        char *comma = strchr(p, ',');
        if (comma == NULL) {
            break;
        }
        *comma = '\0';
        p = comma + 1;
    }
    char *last = fields[count - 1];
    last[strcspn(last, "\r\n")] = '\0';
    return count;
}

static inline int example_read_models(const char *dir, struct example_models *m) {
    char path[4096];
    snprintf(path, sizeof path, "%s/models.txt", dir);
    FILE *f = fopen(path, "r");
    if (f == NULL) {
        fprintf(stderr, "cannot open %s\n", path);
        return 0;
    }
    char line[512];
    int k = 0;
    while (k < 4 && fgets(line, sizeof line, f) != NULL) {
        m->family[k][0] = m->name[k][0] = m->options[k][0] = '\0';
        int n = sscanf(line, "%31s %63s %127s", m->family[k], m->name[k], m->options[k]);
        if (n >= 2) {
            k++;
        }
    }
    fclose(f);
    return k == 4;
}

/* Reads a CSV file of numbers with one header line: rows * columns doubles, row-major. */
static inline double *example_read_table(const char *path, int columns, int *rows) {
    FILE *f = fopen(path, "r");
    if (f == NULL) {
        fprintf(stderr, "cannot open %s\n", path);
        return NULL;
    }
    char *line = NULL;
    size_t size = 0;
    int capacity = 1024;
    int n = 0;
    double *data = malloc(sizeof(double) * (size_t) capacity * (size_t) columns);
    char **fields = malloc(sizeof(char *) * (size_t) columns);
    int first = 1;
    while (getline(&line, &size, f) > 0) {
        if (first) {
            first = 0;
            continue;
        }
        if (line[0] == '\n' || line[0] == '\0') {
            continue;
        }
        if (example_split(line, fields, columns) != columns) {
            fprintf(stderr, "%s: row %d does not have %d columns\n", path, n + 1, columns);
            free(data);
            data = NULL;
            break;
        }
        if (n == capacity) {
            capacity *= 2;
            data = realloc(data, sizeof(double) * (size_t) capacity * (size_t) columns);
        }
        for (int j = 0; j < columns; j++) {
            data[(size_t) n * columns + j] = strtod(fields[j], NULL);
        }
        n++;
    }
    free(line);
    free(fields);
    fclose(f);
    *rows = n;
    return data;
}

static inline int example_read_profile(const char *dir, struct example_profile *p) {
    char path[4096];
    snprintf(path, sizeof path, "%s/profile.csv", dir);
    int n = 0;
    double *t = example_read_table(path, 9, &n);
    if (t == NULL) {
        return 0;
    }
    double **columns[9] = {&p->radius, &p->mass, &p->temperature, &p->density, &p->pressure, &p->luminosity,
                           &p->hydrogen, &p->metals, &p->nabla_mu};
    for (int j = 0; j < 9; j++) {
        *columns[j] = malloc(sizeof(double) * (size_t) n);
        for (int k = 0; k < n; k++) {
            (*columns[j])[k] = t[(size_t) k * 9 + j];
        }
    }
    free(t);
    p->n = n;
    return 1;
}

/* Bit for bit equality of two doubles (tells -0.0 from 0.0, and equal NaNs apart from none). */
static inline int example_same(double a, double b) {
    return memcmp(&a, &b, sizeof a) == 0;
}

#endif
