#include "app/store/records.hpp"

#include <QDate>

namespace mendwright::store {

std::string status_text(JobStatus status) {
    switch (status) {
        case JobStatus::surveyed: return "surveyed";
        case JobStatus::quoted: return "quoted";
        case JobStatus::accepted: return "accepted";
        case JobStatus::in_progress: return "in_progress";
        case JobStatus::completed: return "completed";
        case JobStatus::closed: return "closed";
        case JobStatus::declined: return "declined";
    }
    return "surveyed";
}

std::optional<JobStatus> parse_status(std::string_view text) {
    for (JobStatus status : all_statuses())
        if (text == status_text(status)) return status;
    if (text == "in-progress" || text == "in progress") return JobStatus::in_progress;
    return std::nullopt;
}

const std::vector<JobStatus>& all_statuses() {
    static const std::vector<JobStatus> statuses{JobStatus::surveyed,  JobStatus::quoted, JobStatus::accepted,
                                                 JobStatus::in_progress, JobStatus::completed, JobStatus::closed,
                                                 JobStatus::declined};
    return statuses;
}

std::string urgent_state_text(UrgentState state) {
    switch (state) {
        case UrgentState::open: return "open";
        case UrgentState::remedied: return "remedied";
        case UrgentState::retested: return "retested";
    }
    return "open";
}

std::optional<UrgentState> parse_urgent_state(std::string_view text) {
    if (text == "open") return UrgentState::open;
    if (text == "remedied") return UrgentState::remedied;
    if (text == "retested") return UrgentState::retested;
    return std::nullopt;
}

Date system_today() {
    const QDate today = QDate::currentDate();
    return Date{today.year(), unsigned(today.month()), unsigned(today.day())};
}

Clock fixed_clock(Date today) {
    return [today] { return today; };
}

}  // namespace mendwright::store
