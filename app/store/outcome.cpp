#include "app/store/outcome.hpp"

namespace mendwright::store {

std::string kind_text(ErrorKind kind) {
    switch (kind) {
        case ErrorKind::invalid_input: return "invalid input";
        case ErrorKind::not_found: return "not found";
        case ErrorKind::conflict: return "conflict";
        case ErrorKind::schema_too_new: return "schema too new";
        case ErrorKind::not_a_job_store: return "not a job store";
        case ErrorKind::database: return "database error";
    }
    return "database error";
}

}  // namespace mendwright::store
