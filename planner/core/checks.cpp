#include "planner/core/checks.hpp"

#include <sstream>

namespace mendwright {

std::string number_text(double value) {
    std::ostringstream out;
    out.precision(12);
    out << value;
    return out.str();
}

}  // namespace mendwright
