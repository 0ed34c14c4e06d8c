/*
 * tree.c - the regular files under a folder, found without recursion (a
 * queue of folders still to read), as sorted relative paths.  Anything that
 * is neither a regular file nor a folder, e.g. a symbolic link, is refused:
 * a seal must say exactly which bytes it covers.
 */
#include "archive.h"

#include <dirent.h>
#include <errno.h>
#include <stdlib.h>
#include <string.h>
#include <sys/stat.h>

int tree_join(const char *dir, const char *path, char *out, size_t size)
{
    int n = path[0] != '\0' ? snprintf(out, size, "%s/%s", dir, path) : snprintf(out, size, "%s", dir);
    return n >= 0 && (size_t)n < size ? 0 : -1;
}

int file_set_add(file_set *set, const char *path)
{
    if (set->count == set->cap) {
        size_t cap = set->cap ? set->cap * 2 : 64;
        char **bigger = realloc(set->paths, cap * sizeof *bigger);
        if (bigger == NULL)
            return -1;
        set->paths = bigger;
        set->cap = cap;
    }
    set->paths[set->count] = strdup(path);
    if (set->paths[set->count] == NULL)
        return -1;
    set->count++;
    return 0;
}

static int compare_paths(const void *a, const void *b)
{
    return strcmp(*(char *const *)a, *(char *const *)b);
}

void file_set_sort(file_set *set)
{
    if (set->count > 1)
        qsort(set->paths, set->count, sizeof *set->paths, compare_paths);
}

const char *file_set_find(const file_set *set, const char *path)
{
    char *const *found = set->count > 0 ? bsearch(&path, set->paths, set->count,
                                                  sizeof *set->paths, compare_paths)
                                        : NULL;
    return found != NULL ? *found : NULL;
}

void file_set_free(file_set *set)
{
    for (size_t i = 0; i < set->count; i++)
        free(set->paths[i]);
    free(set->paths);
    memset(set, 0, sizeof *set);
}

static int walk_error(const char *dir, const char *rel, const char *what)
{
    fprintf(stderr, "planewit: %s/%s: %s\n", dir, rel, what);
    return -1;
}

static int is_seal_output(const char *rel)
{
    return strcmp(rel, ARCHIVE_SUMS) == 0 || strcmp(rel, ARCHIVE_SEAL) == 0;
}

/* One entry of folder `rel`: a file joins the set, a folder the queue. */
static int take_entry(const char *dir, const char *rel, file_set *set, file_set *queue)
{
    char full[PATH_MAX];
    struct stat st;
    if (strpbrk(rel, "\n\\") != NULL)
        return walk_error(dir, rel, "a name with a line end or backslash cannot be sealed");
    if (tree_join(dir, rel, full, sizeof full) != 0)
        return walk_error(dir, rel, "path too long");
    if (lstat(full, &st) != 0)
        return walk_error(dir, rel, strerror(errno));
    if (S_ISDIR(st.st_mode))
        return file_set_add(queue, rel) == 0 ? 0 : walk_error(dir, rel, "out of memory");
    if (!S_ISREG(st.st_mode))
        return walk_error(dir, rel, "not a regular file or folder (symbolic links and special "
                                    "files are not sealed)");
    if (is_seal_output(rel))
        return 0;
    return file_set_add(set, rel) == 0 ? 0 : walk_error(dir, rel, "out of memory");
}

static int read_folder(const char *dir, const char *rel, file_set *set, file_set *queue)
{
    char full[PATH_MAX], child[PATH_MAX];
    DIR *d = tree_join(dir, rel, full, sizeof full) == 0 ? opendir(full) : NULL;
    struct dirent *e;
    int rc = 0;
    if (d == NULL)
        return walk_error(dir, rel, "cannot open the folder");
    while (rc == 0 && (e = readdir(d)) != NULL) {
        if (strcmp(e->d_name, ".") == 0 || strcmp(e->d_name, "..") == 0)
            continue;
        int n = snprintf(child, sizeof child, "%s%s%s", rel, rel[0] ? "/" : "", e->d_name);
        if (n < 0 || (size_t)n >= sizeof child)
            rc = walk_error(dir, e->d_name, "path too long");
        else
            rc = take_entry(dir, child, set, queue);
    }
    closedir(d);
    return rc;
}

int tree_list(const char *dir, file_set *set)
{
    file_set queue = {NULL, 0, 0};
    int rc = file_set_add(&queue, "");
    memset(set, 0, sizeof *set);
    for (size_t next = 0; rc == 0 && next < queue.count; next++)
        rc = read_folder(dir, queue.paths[next], set, &queue);
    file_set_free(&queue);
    file_set_sort(set);
    return rc;
}

int tree_read(const char *dir, const char *rel, cli_input *in)
{
    char full[PATH_MAX];
    pw_limits lim;
    pw_limits_default(&lim);
    in->bytes = NULL;
    in->len = 0;
    FILE *f = tree_join(dir, rel, full, sizeof full) == 0 ? fopen(full, "rb") : NULL;
    if (f == NULL)
        return -1;
    pw_code code = pw_read_all(f, lim.max_bytes, &in->bytes, &in->len);
    fclose(f);
    return code == PW_OK ? 0 : -1;
}
