#pragma once
// While one of these is alive, memory freed at the top of the C heap stays with the process for
// reuse instead of going back to the system at each free. Writing a workbook frees and allocates
// again, part after part, a compression state of about 270 kB, and a row of cells per row; with
// the C library's default (give back anything over 128 kB at the top) each part faulted the same
// pages in again. Measured in docs/benchmarks.md, Export. glibc only; elsewhere it does nothing.
//
// Instances may nest and may live on several threads at once: the first sets the threshold and
// the last one to go puts back glibc's documented initial value (mallopt(3), M_TRIM_THRESHOLD:
// 128 kB), after which the next free at the top gives the memory back as before.
//
// Side effects, all from glibc (mallopt(3)):
// - The setting is process-wide: while an export runs it applies to every thread's allocations.
// - Setting M_TRIM_THRESHOLD turns off glibc's dynamic adjustment of the mmap and trim thresholds
//   for the rest of the process: after the first export both stay at their initial 128 kB instead
//   of rising with the sizes the program frees. Harmless for the CLI (one export per process); in
//   the desktop app, large short-lived blocks are then mapped and unmapped each time.
// - A trim threshold the user chose (MALLOC_TRIM_THRESHOLD_, or glibc.malloc.trim_threshold in
//   GLIBC_TUNABLES) is respected: nothing is changed then.

namespace mendwright::spreadsheet {

class HeapKeptForReuse {
public:
    HeapKeptForReuse();
    ~HeapKeptForReuse();
    HeapKeptForReuse(const HeapKeptForReuse&) = delete;
    HeapKeptForReuse& operator=(const HeapKeptForReuse&) = delete;
};

}  // namespace mendwright::spreadsheet
